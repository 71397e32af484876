import { Pressable, StyleSheet, Text, View } from 'react-native';
import { Link } from 'expo-router';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { StatusPanel } from '@/components/status-panel';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';

const SECTIONS = [
  { href: '/settings/people', title: 'People', text: 'Who works here, their roles, invitations.', testID: 'settings-people' },
  { href: '/settings/shop', title: 'Shop', text: 'Name, altitude, pressure unit, comeback window.', testID: 'settings-shop' },
] as const;

/** The Settings landing page: its sections, then the server and database status. */
export function SettingsHome() {
  return (
    <Screen testID="settings-home">
      <ThemedText variant="title" accessibilityRole="header">
        Settings
      </ThemedText>
      <View style={styles.cards}>
        {SECTIONS.map((s) => (
          <Link key={s.href} href={s.href} asChild>
            <Pressable accessibilityRole="link" testID={s.testID} style={styles.card}>
              <Text style={styles.cardTitle}>{s.title} ›</Text>
              <Text style={styles.cardText}>{s.text}</Text>
            </Pressable>
          </Link>
        ))}
      </View>
      <ThemedText variant="subheading">System status</ThemedText>
      <StatusPanel />
    </Screen>
  );
}

const styles = StyleSheet.create({
  cards: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  card: {
    flexGrow: 1,
    flexBasis: 280,
    minHeight: touchTarget * 2,
    backgroundColor: colors.surface,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: colors.line,
    padding: space.lg,
    gap: space.xs,
  },
  cardTitle: { fontFamily: fonts.bold, fontSize: 20, color: colors.accentDark },
  cardText: { ...type.body, color: colors.inkMuted },
});
