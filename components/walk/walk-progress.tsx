import { StyleSheet, Text, View } from 'react-native';
import type { WalkPosition } from '@/shared/schemas/walks';
import { colors, fonts, space, type } from '@/components/theme';

/** Steps taken and the shortest way left to a cause, in words and as a bar. */
export function WalkProgress({ position }: { position: WalkPosition }) {
  const left = position.shortestToCause;
  const taken = position.stepsTaken;
  const fraction = position.final ? 1 : left === null ? 0 : taken / (taken + left);
  const words = position.final
    ? 'End of the tree reached'
    : left === null
      ? 'No cause can be reached from here'
      : `At least ${left} more ${left === 1 ? 'answer' : 'answers'} to a cause`;
  return (
    <View
      style={styles.wrap}
      testID="walk-progress"
      role="progressbar"
      // react-native-web maps aria-* props (not accessibilityValue): a progress bar needs a name and its values.
      aria-label={`Progress: ${taken} ${taken === 1 ? 'answer' : 'answers'} so far. ${words}`}
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={Math.round(fraction * 100)}
    >
      <Text style={styles.text}>
        <Text style={styles.strong}>
          {taken} {taken === 1 ? 'answer' : 'answers'} so far
        </Text>
        {` · ${words}`}
      </Text>
      <View style={styles.bar}>
        <View style={[styles.fill, { width: `${Math.round(fraction * 100)}%` }]} />
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
