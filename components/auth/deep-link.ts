import { Platform } from 'react-native';

/**
 * The address the page was opened at, kept from before the router starts.
 * While the session loads, the signed-in shell does not render its screens,
 * and the router then falls back to `/`; this remembers where the person
 * meant to go (a reloaded job page, a link from a colleague) so the gate and
 * `(app)/index` can send them there once the session is known.
 */
let pending: string | undefined = (() => {
  if (Platform.OS !== 'web' || typeof window === 'undefined') return undefined;
  const here = `${window.location.pathname}${window.location.search}`;
  return here === '/' ? undefined : here;
})();

/** The remembered address, without using it up. */
export const peekDeepLink = () => pending;

/** The remembered address, used up (each deep link is followed once). */
export function takeDeepLink(): string | undefined {
  const p = pending;
  pending = undefined;
  return p;
}
