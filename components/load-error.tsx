import { StyleSheet, View } from 'react-native';
import { canRetry } from '@/hooks/api-client';
import { Button } from './button';
import { Notice } from './notice';
import { space } from './theme';

/** A screen's read that failed: what went wrong, and "Try again" only when that can help. */
export function LoadError({ title, error, onRetry, busy, testID }: { title: string; error: Error | null | undefined; onRetry: () => unknown; busy?: boolean; testID?: string }) {
  return (
    <View style={styles.col} testID={testID}>
      <Notice tone="error" title={title}>
        {error?.message ?? 'It could not be loaded.'}
      </Notice>
      {canRetry(error) ? <Button label="Try again" kind="secondary" onPress={() => void onRetry()} busy={busy} testID="load-retry" /> : null}
    </View>
  );
}

const styles = StyleSheet.create({ col: { gap: space.md } });
