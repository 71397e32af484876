import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space, type } from './theme';

type Tone = 'info' | 'caution' | 'error' | 'ok';

const tones: Record<Tone, { bg: string; border: string; icon: string; word: string }> = {
  info: { bg: colors.accentSoft, border: colors.accent, icon: 'ℹ', word: 'Note' },
  caution: { bg: colors.cautionSoft, border: colors.caution, icon: '⚠', word: 'Caution' },
  error: { bg: colors.dangerSoft, border: colors.danger, icon: '✖', word: 'Problem' },
  ok: { bg: colors.okSoft, border: colors.ok, icon: '✔', word: 'OK' },
};

/** A boxed message with an icon and a word, so meaning never rests on colour alone. */
export function Notice({ tone, title, children, testID }: { tone: Tone; title?: string; children?: ReactNode; testID?: string }) {
  const t = tones[tone];
  return (
    <View
      testID={testID}
      accessibilityRole={tone === 'error' || tone === 'caution' ? 'alert' : undefined}
      style={[styles.box, { backgroundColor: t.bg, borderLeftColor: t.border }]}
    >
      <Text style={[styles.title, { color: tone === 'caution' ? colors.caution : colors.ink }]}>
        {t.icon} {title ?? t.word}
      </Text>
      {typeof children === 'string' ? <Text style={styles.body}>{children}</Text> : children}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderLeftWidth: 6, borderRadius: radius.sm, padding: space.lg, gap: space.xs },
  title: { fontFamily: fonts.bold, fontSize: 17 },
  body: { ...type.body, color: colors.ink },
});
