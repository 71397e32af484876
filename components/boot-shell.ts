import { useEffect } from 'react';
import { Platform } from 'react-native';

/**
 * Removes the pre-rendered sign-in shell of public/index.html (shown on
 * /sign-in until the JavaScript has run). Called by the frames every first
 * screen renders in, after their first paint, so the shell and the real
 * screen are never both missing.
 */
export function useDismissBootShell() {
  useEffect(() => {
    if (Platform.OS === 'web' && typeof document !== 'undefined') document.getElementById('boot-shell')?.remove();
  }, []);
}
