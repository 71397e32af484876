import { StyleSheet, Text, View } from 'react-native';
import type { Verdict } from '@/shared/readings/reading-kinds';
import { VERDICT_LABELS, VERDICT_TONES, type VerdictTone } from '@/shared/readings/verdict-labels';
import { colors, fonts, radius, space } from '@/components/theme';

const TONE_STYLE: Record<VerdictTone, { icon: string; fg: string; bg: string }> = {
  ok: { icon: '✔', fg: colors.ok, bg: colors.okSoft },
  caution: { icon: '⚠', fg: colors.caution, bg: colors.cautionSoft },
  problem: { icon: '✖', fg: colors.danger, bg: colors.dangerSoft },
};

/** A verdict as an icon plus words (never colour alone). */
export function VerdictBadge({ verdict, testID }: { verdict: Verdict; testID?: string }) {
  const t = TONE_STYLE[VERDICT_TONES[verdict]];
  return (
    <View style={[styles.badge, { backgroundColor: t.bg, borderColor: t.fg }]} testID={testID} accessibilityRole="text" accessibilityLabel={`Verdict: ${VERDICT_LABELS[verdict]}`}>
      <Text style={[styles.icon, { color: t.fg }]} aria-hidden>
        {t.icon}
      </Text>
      <Text style={[styles.word, { color: colors.ink }]}>{VERDICT_LABELS[verdict]}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: { flexDirection: 'row', alignItems: 'center', alignSelf: 'flex-start', gap: space.sm, borderWidth: 2, borderRadius: radius.md, paddingHorizontal: space.md, paddingVertical: space.sm },
  icon: { fontFamily: fonts.bold, fontSize: 20 },
  word: { fontFamily: fonts.bold, fontSize: 20 },
});
