import { StyleSheet, Text, View } from 'react-native';
import { Link } from 'expo-router';
import { colors, fonts, space, touchTarget } from '@/components/theme';

const LINKS = [
  { key: 'home', href: '/settings', label: 'Settings' },
  { key: 'people', href: '/settings/people', label: 'People' },
  { key: 'shop', href: '/settings/shop', label: 'Shop' },
] as const;

/** A short trail between the Settings pages. */
export function SettingsNav({ current }: { current: 'people' | 'shop' }) {
  return (
    <View style={styles.row} role="navigation" accessibilityLabel="Settings">
      {LINKS.map((l) =>
        l.key === current ? (
          <Text key={l.key} style={[styles.link, styles.current]} aria-current="page">
            {l.label}
          </Text>
        ) : (
          <Link key={l.key} href={l.href} style={styles.link}>
            {l.label}
          </Link>
        ),
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg },
  link: { minHeight: touchTarget, lineHeight: touchTarget, fontFamily: fonts.semibold, fontSize: 16, color: colors.accentDark, textDecorationLine: 'underline' },
  current: { color: colors.ink, textDecorationLine: 'none', fontFamily: fonts.bold },
});
