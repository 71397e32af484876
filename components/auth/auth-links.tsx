import { StyleSheet, Text, View } from 'react-native';
import { Link, type Href } from 'expo-router';
import { colors, fonts, space, touchTarget } from '@/components/theme';

/** Links between the sign-in screens, as large text targets. */
export function AuthLinks({ links }: { links: Array<{ href: Href; label: string; testID?: string }> }) {
  return (
    <View style={styles.row}>
      {links.map((l) => (
        <Link key={l.label} href={l.href} style={styles.link} testID={l.testID}>
          {l.label}
        </Link>
      ))}
    </View>
  );
}

/** A heading and an explanation at the top of an auth card. */
export function AuthHeading({ title, children }: { title: string; children?: string }) {
  return (
    <View style={styles.heading}>
      <Text style={styles.title} accessibilityRole="header" aria-level={2}>
        {title}
      </Text>
      {children ? <Text style={styles.text}>{children}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.xl },
  link: {
    minHeight: touchTarget,
    lineHeight: touchTarget,
    fontFamily: fonts.semibold,
    fontSize: 16,
    color: colors.accentDark,
    textDecorationLine: 'underline',
  },
  heading: { gap: space.xs },
  title: { fontFamily: fonts.bold, fontSize: 22, lineHeight: 28, color: colors.ink },
  text: { fontFamily: fonts.regular, fontSize: 16, lineHeight: 23, color: colors.inkMuted },
});
