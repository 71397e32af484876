import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { StatusPanel } from '@/components/status-panel';

/** First screen: the product and whether its server and database answer. */
export default function Home() {
  return (
    <Screen testID="home">
      <ThemedText variant="title" accessibilityRole="header">Baywalk</ThemedText>
      <ThemedText muted>Guided fault-finding for the days after an engine install.</ThemedText>
      <StatusPanel />
    </Screen>
  );
}
