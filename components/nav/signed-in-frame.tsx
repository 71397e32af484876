import { useDeferredValue, type ReactNode } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { useSession } from '@/hooks/use-session';
import { usePathname } from 'expo-router';
import { useDismissBootShell } from '@/components/boot-shell';
import { walkPageId } from '@/shared/walk-paths';
import { Button } from '@/components/button';
import { Notice } from '@/components/notice';
import { colors, space } from '@/components/theme';
import { AppShell } from './app-shell';

/**
 * What `(app)/_layout` shows: the shell once the person is known, a spinner
 * while the session loads (or while the gate sends an anonymous person to
 * sign-in), and a retry when the server cannot be reached.
 */
export function SignedInFrame({ children }: { children: ReactNode }) {
  const session = useSession();
  // A signed-in person who opened /sign-in: the gate moves them here. A walk's
  // first paint stays for the walk screen, unless the frame cannot show it.
  useDismissBootShell(walkPageId(usePathname()) !== undefined && !session.isError);
  // The shell and the first screen are rendered as a deferred update once the
  // person is known, in slices rather than as one long task (see walk-screen.tsx).
  const shellReady = useDeferredValue(!!session.data);
  if (session.data && shellReady) return <AppShell me={session.data}>{children}</AppShell>;
  if (session.isError) {
    return (
      <View style={styles.center} testID="session-error">
        <View style={styles.box}>
          <Notice tone="error" title="Cannot check your sign-in">
            {session.error.message}
          </Notice>
          <Button label="Try again" kind="secondary" onPress={() => void session.refetch()} busy={session.isFetching} />
        </View>
      </View>
    );
  }
  return (
    <View style={styles.center} testID="session-loading">
      <ActivityIndicator color={colors.accent} />
    </View>
  );
}

const styles = StyleSheet.create({
  center: { flex: 1, alignItems: 'center', justifyContent: 'center', backgroundColor: colors.paper, padding: space.lg },
  box: { width: '100%', maxWidth: 480, gap: space.md },
});
