import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { Finding } from '@/trees/engine-types';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';

const mark = (f: Finding) => (f.severity === 'error' ? '✖ Problem' : '⚠ Warning');

/** Findings as lines with an icon and a word each (errors and warnings are never told apart by colour alone). */
export function FindingList({ findings, onOpen, testID }: { findings: Finding[]; onOpen?: (stepId: string) => void; testID?: string }) {
  return (
    <View style={styles.list} testID={testID} accessibilityLiveRegion="polite">
      {findings.map((f, i) => {
        const line = (
          <Text style={styles.line}>
            <Text style={[styles.mark, { color: f.severity === 'error' ? colors.danger : colors.caution }]}>{mark(f)}: </Text>
            {f.message}
          </Text>
        );
        return onOpen && f.stepId ? (
          <Pressable key={i} accessibilityRole="button" accessibilityHint="Opens the step" onPress={() => onOpen(f.stepId!)} style={({ pressed }) => [styles.item, styles.tap, pressed && styles.pressed]} testID={testID ? `${testID}-${i}` : undefined}>
            {line}
          </Pressable>
        ) : (
          <View key={i} style={styles.item}>
            {line}
          </View>
        );
      })}
    </View>
  );
}

/** The checks on the whole draft: how many problems and warnings, or that it is ready. */
export function FindingsSummary({ findings, onOpen }: { findings: Finding[]; onOpen: (stepId: string) => void }) {
  const errors = findings.filter((f) => f.severity === 'error');
  const warnings = findings.filter((f) => f.severity === 'warning');
  const tone = errors.length ? 'error' : warnings.length ? 'warning' : 'ok';
  const title = errors.length
    ? `✖ ${errors.length === 1 ? '1 problem' : `${errors.length} problems`} to fix before publishing`
    : warnings.length
      ? `⚠ Ready to publish, with ${warnings.length === 1 ? '1 warning' : `${warnings.length} warnings`} to read`
      : '✔ The checks find nothing: ready to publish';
  return (
    <View style={[styles.box, styles[tone]]} testID="draft-checks" accessibilityLiveRegion="polite">
      <Text style={styles.title} testID="draft-checks-title">
        {title}
      </Text>
      {findings.length ? <FindingList findings={[...errors, ...warnings]} onOpen={onOpen} testID="draft-findings" /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.xs },
  item: { paddingVertical: space.xs },
  tap: { minHeight: touchTarget, justifyContent: 'center', paddingHorizontal: space.sm, borderRadius: radius.sm, backgroundColor: colors.surface },
  pressed: { opacity: 0.8 },
  line: { ...type.small, color: colors.ink },
  mark: { fontFamily: fonts.bold },
  box: { borderLeftWidth: 6, borderRadius: radius.sm, padding: space.md, gap: space.sm },
  error: { backgroundColor: colors.dangerSoft, borderLeftColor: colors.danger },
  warning: { backgroundColor: colors.cautionSoft, borderLeftColor: colors.caution },
  ok: { backgroundColor: colors.okSoft, borderLeftColor: colors.ok },
  title: { fontFamily: fonts.bold, fontSize: 17, color: colors.ink },
});
