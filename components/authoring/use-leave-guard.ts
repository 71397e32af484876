import { useEffect, useRef } from 'react';
import { Platform } from 'react-native';

/**
 * While `message` is set, leaving the page asks first: the browser's own
 * prompt on reload or tab close, and a confirm on any in-app link. Links are
 * caught in the capture phase, before the router sees the click.
 */
export function useLeaveGuard(message: string | undefined) {
  const current = useRef(message);
  current.current = message;
  useEffect(() => {
    if (Platform.OS !== 'web' || typeof window === 'undefined') return;
    const onBeforeUnload = (e: BeforeUnloadEvent) => {
      if (!current.current) return;
      e.preventDefault();
      e.returnValue = '';
    };
    const onClick = (e: MouseEvent) => {
      if (!current.current || e.defaultPrevented || e.button !== 0) return;
      const link = (e.target as Element | null)?.closest?.('a[href]');
      if (!link || link.getAttribute('target') === '_blank' || link.hasAttribute('download')) return;
      if (!window.confirm(current.current)) {
        e.preventDefault();
        e.stopPropagation();
      }
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    document.addEventListener('click', onClick, true);
    return () => {
      window.removeEventListener('beforeunload', onBeforeUnload);
      document.removeEventListener('click', onClick, true);
    };
  }, []);
}

/** Asks before an in-app move the editor makes itself (its own buttons); true when it may go ahead. */
export function confirmLeave(message: string | undefined): boolean {
  if (!message) return true;
  if (Platform.OS === 'web' && typeof window !== 'undefined') return window.confirm(message);
  return true;
}
