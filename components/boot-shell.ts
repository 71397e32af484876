import { useEffect } from 'react';
import { Platform } from 'react-native';

/**
 * The pages the server draws before the JavaScript arrives, by element id:
 * the sign-in page of public/index.html, and a walk's current step
 * (server/http/walk-first-paint.ts). Each stays until the real screen has
 * drawn the same thing, so the shell and the screen are never both missing.
 */
const SIGN_IN_SHELL = 'boot-shell';
const WALK_SHELL = 'boot-shell-walk';

function remove(id: string) {
  if (Platform.OS === 'web' && typeof document !== 'undefined') document.getElementById(id)?.remove();
}

/**
 * Frames (sign-in, signed-in) remove the drawn pages once they have mounted;
 * `keepWalk` leaves the walk's for the walk screen below to replace.
 */
export function useDismissBootShell(keepWalk = false) {
  useEffect(() => {
    remove(SIGN_IN_SHELL);
    if (!keepWalk) remove(WALK_SHELL);
  }, [keepWalk]);
}

/** The walk screen removes the walk's first paint once it has drawn the step itself (or said why not), and when it goes. */
export function useDismissWalkShell(drawn: boolean) {
  useEffect(() => {
    if (drawn) remove(WALK_SHELL);
  }, [drawn]);
  useEffect(() => () => remove(WALK_SHELL), []);
}
