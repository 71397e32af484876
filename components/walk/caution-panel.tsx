import { StyleSheet, Text, View } from 'react-native';
import { HAZARD_LABELS, type Hazard } from '@/trees/tree-format';
import { colors, fonts, radius, space, type } from '@/components/theme';
import { CAUTION_DEFER, CAUTION_HEADING } from '@/shared/walk-words';

/**
 * A step's safety cautions, shown before anything else on the step: a thick
 * amber frame, a warning sign and the word "Caution" with each hazard's name.
 */
export function CautionPanel({ cautions }: { cautions: ReadonlyArray<{ hazard: Hazard; text: string }> }) {
  if (!cautions.length) return null;
  return (
    <View style={styles.box} accessibilityRole="alert" testID="step-cautions">
      <Text style={styles.head}>{CAUTION_HEADING}</Text>
      {cautions.map((c, i) => (
        <View key={i} style={styles.item}>
          <Text style={styles.hazard}>⚠ {HAZARD_LABELS[c.hazard]}</Text>
          <Text style={styles.text}>{c.text}</Text>
        </View>
      ))}
      <Text style={styles.small}>{CAUTION_DEFER}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 3, borderColor: colors.caution, backgroundColor: colors.cautionSoft, borderRadius: radius.md, padding: space.lg, gap: space.md },
  head: { fontFamily: fonts.bold, fontSize: 19, color: colors.caution },
  item: { gap: 2 },
  hazard: { fontFamily: fonts.bold, fontSize: 16, color: colors.caution },
  text: { ...type.body, color: colors.ink },
  small: { ...type.small, color: colors.inkMuted },
});
