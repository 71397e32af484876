import { StyleSheet, Text, View } from 'react-native';
import { HAZARD_LABELS, type Hazard } from '@/trees/tree-format';
import { colors, fonts, radius, space, type } from '@/components/theme';

/** A step's cautions, highlighted in the caution colour with a warning sign and the hazard's name. */
export function CautionList({ cautions, testID }: { cautions: ReadonlyArray<{ hazard: Hazard; text: string }>; testID?: string }) {
  if (cautions.length === 0) return null;
  return (
    <View style={styles.box} testID={testID} accessibilityRole="alert">
      {cautions.map((c, i) => (
        <Text key={i} style={styles.line}>
          <Text style={styles.hazard}>⚠ Caution · {HAZARD_LABELS[c.hazard]}: </Text>
          {c.text}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { backgroundColor: colors.cautionSoft, borderLeftWidth: 5, borderLeftColor: colors.caution, borderRadius: radius.sm, padding: space.md, gap: space.xs },
  line: { ...type.small, color: colors.ink },
  hazard: { fontFamily: fonts.bold, color: colors.caution },
});
