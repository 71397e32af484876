import { StyleSheet, Text, View } from 'react-native';
import { STEP_KIND_LABELS, type StepKind } from '@/trees/tree-format';
import { colors, fonts, radius, space } from '@/components/theme';
import { KindIcon } from './kind-icon';

const KIND_COLOURS: Record<StepKind, string> = {
  ask: colors.accentDark,
  reading: colors.accentDark,
  action: colors.ink,
  cause: colors.ok,
  refer: colors.inkMuted,
};

/** A step's kind as an icon and a word (never colour alone). */
export function StepKindBadge({ kind, testID }: { kind: StepKind; testID?: string }) {
  const color = KIND_COLOURS[kind];
  return (
    <View style={[styles.badge, { borderColor: color }]} testID={testID} accessibilityLabel={`${STEP_KIND_LABELS[kind]} step`}>
      <KindIcon kind={kind} color={color} />
      <Text style={[styles.word, { color }]}>{STEP_KIND_LABELS[kind]}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: space.xs,
    borderWidth: 1.5,
    borderRadius: radius.sm,
    paddingHorizontal: space.sm,
    paddingVertical: 2,
    backgroundColor: colors.surface,
  },
  word: { fontFamily: fonts.semibold, fontSize: 14, lineHeight: 19 },
});
