import { StyleSheet, Text, View } from 'react-native';
import type { WalkPosition } from '@/shared/schemas/walks';
import { walkProgress } from '@/shared/walk-words';
import { colors, fonts, space, type } from '@/components/theme';

/** Steps taken and the shortest way left to a cause, in words and as a bar. */
export function WalkProgress({ position }: { position: WalkPosition }) {
  const { taken, words, percent } = walkProgress(position);
  return (
    <View
      style={styles.wrap}
      testID="walk-progress"
      role="progressbar"
      // react-native-web maps aria-* props (not accessibilityValue): a progress bar needs a name and its values.
      aria-label={`Progress: ${taken}. ${words}`}
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={percent}
    >
      <Text style={styles.text}>
        <Text style={styles.strong}>{taken}</Text>
        {` · ${words}`}
      </Text>
      <View style={styles.bar}>
        <View style={[styles.fill, { width: `${percent}%` }]} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  text: { ...type.small, color: colors.inkMuted },
  strong: { fontFamily: fonts.bold, color: colors.ink },
  bar: { height: 8, borderRadius: 4, backgroundColor: colors.line, overflow: 'hidden' },
  fill: { height: 8, backgroundColor: colors.accent },
});
