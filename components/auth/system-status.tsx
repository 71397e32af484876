import { StyleSheet, View } from 'react-native';
import { StatusPanel } from '@/components/status-panel';
import { ThemedText } from '@/components/themed-text';
import { space } from '@/components/theme';

/** The server and database status, below the sign-in card, so a failed sign-in can be told from an outage. */
export function SystemStatus() {
  return (
    <View style={styles.col} testID="system-status">
      <ThemedText variant="subheading">System status</ThemedText>
      <StatusPanel />
    </View>
  );
}

const styles = StyleSheet.create({ col: { gap: space.md } });
