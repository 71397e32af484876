import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { useHealth } from '@/hooks/use-health';
import { Button } from './button';
import { Notice } from './notice';
import { ThemedText } from './themed-text';
import { colors, space } from './theme';

/** Shows whether the server and database answer, with loading, error and retry states. */
export function StatusPanel() {
  const health = useHealth();

  if (health.isPending) {
    return (
      <View style={styles.row} testID="status-loading">
        <ActivityIndicator color={colors.accent} />
        <ThemedText muted>Checking the server and database…</ThemedText>
      </View>
    );
  }
  if (health.isError) {
    return (
      <View style={styles.col} testID="status-error">
        <Notice tone="error" title="Server not reachable">{health.error.message}</Notice>
        <Button label="Try again" kind="secondary" onPress={() => void health.refetch()} busy={health.isFetching} />
      </View>
    );
  }
  const h = health.data;
  return (
    <View style={styles.col} testID="status-ready">
      <Notice tone="ok" title="Server running">{`Up for ${h.server.uptimeSeconds} s.`}</Notice>
      {h.database.ok ? (
        <Notice tone="ok" title="Database connected" testID="status-db-ok">{`MariaDB ${h.database.version}, answered in ${h.database.latencyMs} ms.`}</Notice>
      ) : (
        <Notice tone="error" title="Database not answering" testID="status-db-down">{h.database.message}</Notice>
      )}
      <Button label="Check again" kind="secondary" onPress={() => void health.refetch()} busy={health.isFetching} testID="status-refresh" />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  col: { gap: space.md },
});
