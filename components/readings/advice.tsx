import { StyleSheet, Text, View } from 'react-native';
import type { Caution } from '@/shared/readings/cautions';
import { ThemedText } from '@/components/themed-text';
import { colors, fonts, radius, space, type } from '@/components/theme';

interface Props {
  causes: Array<{ cause: string; reason: string }>;
  nextChecks: string[];
  cautions: Caution[];
  testID: string;
}

/** Ranked likely causes, then cautions (before any check that needs them), then what to check next. */
export function Advice({ causes, nextChecks, cautions, testID }: Props) {
  if (causes.length === 0 && nextChecks.length === 0) return null;
  return (
    <View style={styles.col}>
      {causes.length > 0 ? (
        <View style={styles.col} testID={`${testID}-causes`}>
          <ThemedText variant="subheading" accessibilityRole="header">
            Likely causes, most likely first
          </ThemedText>
          {causes.map((c, i) => (
            <View key={c.cause} style={styles.item}>
              <Text style={styles.rank}>{i + 1}.</Text>
              <View style={styles.itemBody}>
                <Text style={styles.cause}>{c.cause}</Text>
                <Text style={styles.reason}>{c.reason}</Text>
              </View>
            </View>
          ))}
        </View>
      ) : null}
      {cautions.map((c) => (
        <View key={c.kind} style={styles.caution} accessibilityRole="alert" testID={`${testID}-caution-${c.kind}`}>
          <Text style={styles.cautionTitle}>⚠ Caution · {c.title}</Text>
          {c.points.map((p) => (
            <Text key={p} style={styles.point}>
              • {p}
            </Text>
          ))}
        </View>
      ))}
      {nextChecks.length > 0 ? (
        <View style={styles.col} testID={`${testID}-checks`}>
          <ThemedText variant="subheading" accessibilityRole="header">
            What to check next
          </ThemedText>
          {nextChecks.map((c, i) => (
            <View key={c} style={styles.item}>
              <Text style={styles.rank}>{i + 1}.</Text>
              <Text style={[styles.reason, styles.itemBody]}>{c}</Text>
            </View>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  col: { gap: space.sm },
  item: { flexDirection: 'row', gap: space.sm },
  itemBody: { flex: 1, gap: 2 },
  rank: { ...type.body, fontFamily: fonts.bold, color: colors.inkMuted, minWidth: 22 },
  cause: { ...type.body, fontFamily: fonts.bold, color: colors.ink },
  reason: { ...type.body, color: colors.ink },
  caution: { backgroundColor: colors.cautionSoft, borderLeftWidth: 6, borderLeftColor: colors.caution, borderRadius: radius.sm, padding: space.md, gap: space.xs },
  cautionTitle: { fontFamily: fonts.bold, fontSize: 17, color: colors.caution },
  point: { ...type.small, color: colors.ink },
});
