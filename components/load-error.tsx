import { StyleSheet, View } from 'react-native';
import { canRetry } from '@/hooks/api-client';
import { Button } from './button';
import { Notice } from './notice';
import { space } from './theme';

interface Props {
  title: string;
  /** The failed read's error; none when nothing could be asked (then `missing` says why). */
  error: Error | null | undefined;
  missing?: string;
  onRetry: () => unknown;
  busy?: boolean;
  testID?: string;
}

/** A screen's read that failed: what went wrong, and "Try again" only when that can help. */
export function LoadError({ title, error, missing = 'It could not be loaded.', onRetry, busy, testID }: Props) {
  return (
    <View style={styles.col} testID={testID}>
      <Notice tone="error" title={title}>
        {error?.message ?? missing}
      </Notice>
      {canRetry(error) ? <Button label="Try again" kind="secondary" onPress={() => void onRetry()} busy={busy} testID="load-retry" /> : null}
    </View>
  );
}

const styles = StyleSheet.create({ col: { gap: space.md } });
