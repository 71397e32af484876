import { StyleSheet, Text, View } from 'react-native';
import type { TreeDetail } from '@/shared/schemas/trees';
import { ThemedText } from '@/components/themed-text';
import { colors, fonts, radius, space, type } from '@/components/theme';
import { StepKindBadge } from './step-kind-badge';

/** The causes a tree can find (nearest first) and where it hands over instead. */
export function CauseList({ causes, refers }: Pick<TreeDetail, 'causes' | 'refers'>) {
  return (
    <View style={styles.col}>
      <ThemedText variant="heading" accessibilityRole="header">
        Causes it can find
      </ThemedText>
      <View style={styles.col} testID="tree-causes">
        {causes.map((c) => (
          <View key={c.stepId} style={styles.item} testID={`cause-${c.stepId}`}>
            <StepKindBadge kind="cause" />
            <Text style={styles.title}>{c.title}</Text>
            <Text style={styles.line}>
              <Text style={styles.key}>Area: </Text>
              {c.area}
            </Text>
            <Text style={styles.line}>
              <Text style={styles.key}>Fix: </Text>
              {c.fix}
            </Text>
            <Text style={styles.muted}>{`At least ${c.shortest} ${c.shortest === 1 ? 'answer' : 'answers'} from the start.`}</Text>
          </View>
        ))}
      </View>
      {refers.length > 0 ? (
        <>
          <ThemedText variant="heading" accessibilityRole="header">
            Where it hands over
          </ThemedText>
          <View style={styles.col} testID="tree-refers">
            {refers.map((r) => (
              <View key={r.stepId} style={styles.item}>
                <StepKindBadge kind="refer" />
                <Text style={styles.title}>{r.title}</Text>
                <Text style={styles.line}>
                  <Text style={styles.key}>To: </Text>
                  {r.to}
                </Text>
                <Text style={styles.muted}>{r.reason}</Text>
              </View>
            ))}
          </View>
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  col: { gap: space.md },
  item: { backgroundColor: colors.surface, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, padding: space.lg, gap: space.xs },
  title: { ...type.subheading, color: colors.ink },
  line: { ...type.body, fontSize: 16, color: colors.ink },
  key: { fontFamily: fonts.semibold },
  muted: { ...type.small, color: colors.inkMuted },
});
