import { useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';
import { router } from 'expo-router';
import type { TreeSummary } from '@/shared/schemas/trees';
import type { Job } from '@/shared/schemas/jobs';
import { SYMPTOM_LABELS } from '@/trees/tree-format';
import { useTrees } from '@/hooks/use-trees';
import { useStartWalk } from '@/hooks/use-walks';
import { Notice } from '@/components/notice';
import { ThemedText } from '@/components/themed-text';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';
import { treesForJob } from './tree-order';

/** "Start a walk": trees by symptom, those matching the job's install suggested first. */
export function TreePicker({ job }: { job: Job }) {
  const trees = useTrees({});
  const start = useStartWalk();
  const [startingId, setStartingId] = useState<number | null>(null);

  if (trees.isPending) return <ActivityIndicator color={colors.accent} />;
  if (trees.isError) return <Notice tone="error" title="Could not load the trees">{trees.error.message}</Notice>;
  const { suggested, bySymptom } = treesForJob(trees.data.trees, job.install.map((c) => c.type));

  const pick = async (t: TreeSummary) => {
    setStartingId(t.id);
    try {
      const { walk } = await start.mutateAsync({ jobId: job.id, treeId: t.id });
      router.push(`/walks/${walk.id}`);
    } finally {
      setStartingId(null);
    }
  };
  const option = (t: TreeSummary) => (
    <Pressable
      key={t.id}
      accessibilityRole="button"
      accessibilityLabel={`Start a walk: ${t.title}`}
      accessibilityState={{ busy: startingId === t.id, disabled: startingId !== null }}
      disabled={startingId !== null}
      onPress={() => void pick(t)}
      testID={`start-walk-${t.slug}`}
      style={({ pressed }) => [styles.option, pressed && styles.pressed]}
    >
      <Text style={styles.title}>{startingId === t.id ? 'Starting… ' : '▶ '}{t.title}</Text>
      <Text style={styles.meta}>
        {SYMPTOM_LABELS[t.symptom]} · {t.steps} steps · version {t.publishedVersion}
      </Text>
    </Pressable>
  );

  return (
    <View style={styles.wrap} testID="tree-picker">
      {start.isError ? <Notice tone="error" title="The walk did not start">{start.error.message}</Notice> : null}
      {suggested.length ? (
        <View style={styles.group}>
          <ThemedText variant="subheading">Suggested for this install</ThemedText>
          {suggested.map(option)}
        </View>
      ) : null}
      {bySymptom.map((g) => (
        <View key={g.symptom} style={styles.group}>
          <ThemedText variant="subheading">{g.label}</ThemedText>
          {g.trees.map(option)}
        </View>
      ))}
      {!suggested.length && !bySymptom.length ? <Notice tone="info" title="No published trees">Ask a lead technician to publish a tree first.</Notice> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  group: { gap: space.sm },
  option: { minHeight: touchTarget + 12, justifyContent: 'center', gap: 2, padding: space.md, borderRadius: radius.md, borderWidth: 2, borderColor: colors.accent, backgroundColor: colors.surface },
  pressed: { backgroundColor: colors.accentSoft },
  title: { fontFamily: fonts.bold, fontSize: 17, color: colors.accentDark },
  meta: { ...type.small, color: colors.inkMuted },
});
