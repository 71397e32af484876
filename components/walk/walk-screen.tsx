import { useDeferredValue, useState } from 'react';
import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import { router } from 'expo-router';
import { availableAnswers } from '@/trees/engine';
import type { WalkDetail } from '@/shared/schemas/walks';
import { WALK_OUTCOME_LABELS } from '@/shared/schemas/walks';
import { BACK_LABEL, walkJobLine } from '@/shared/walk-words';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Notice } from '@/components/notice';
import { Button } from '@/components/button';
import { colors, fonts, space, type } from '@/components/theme';
import type { WalkSource } from './walk-source';
import { WalkProgress } from './walk-progress';
import { WalkHistory } from './walk-history';
import { StepView } from './step-view';
import { useStepSender } from './use-step-sender';
import { LoadError } from '@/components/load-error';
import { useDismissWalkShell } from '@/components/boot-shell';

/**
 * The walk screen body: one step at a time, with state from the server (so a
 * reload or a second device resumes at the same step). The data source comes
 * from outside: staff walks now, guest walks by link later.
 */
export function WalkScreen({ source }: { source: WalkSource }) {
  const sender = useStepSender(source);
  const [showHistory, setShowHistory] = useState(false);
  // The walk's first render is large (cautions, markdown, answers): when its
  // data lands, React renders it as a deferred update, in slices, instead of
  // one long task that blocks the page. Later updates render at once.
  const firstRenderDone = useDeferredValue(source.data !== undefined);
  const opening = source.isLoading || (source.data !== undefined && !firstRenderDone);
  // The server may have drawn this step already (server/http/walk-first-paint.ts): it goes once this screen shows it.
  useDismissWalkShell(!opening);

  if (opening) {
    return (
      <Screen testID="walk-loading">
        <ActivityIndicator color={colors.accent} />
        <ThemedText muted>Opening the walk…</ThemedText>
      </Screen>
    );
  }
  if (!source.data) {
    return (
      <Screen testID="walk-error">
        <LoadError title="Could not open the walk" error={source.error} missing="That address names no walk." onRetry={source.refetch} />
      </Screen>
    );
  }
  const w = source.data;
  const finished = w.walk.status === 'finished';
  const stepId = w.position.stepId;

  return (
    <Screen testID="walk-screen">
      <WalkHeader walk={w} />
      <WalkProgress position={w.position} />
      {/* Only once there is an answer to take back: at the first step a dead button would sit where the step starts. */}
      {finished || w.position.stepsTaken === 0 ? null : (
        <View style={styles.row}>
          <Button
            label={BACK_LABEL}
            kind="secondary"
            disabled={sender.busy}
            onPress={() => void sender.undo()}
            testID="walk-back"
          />
        </View>
      )}
      {finished ? (
        <Finished walk={w} source={source} />
      ) : (
        <>
          {sender.error ? (
            <View style={styles.col}>
              <Notice tone="error" title={sender.error.retryable ? 'Not saved yet' : 'Not accepted'} testID="step-error">
                {sender.error.message}
              </Notice>
              {sender.unsent ? (
                <View style={styles.row}>
                  <Button label={`Retry: ${sender.unsent.words}`} onPress={() => void sender.retry()} testID="step-retry" />
                  <Button label="Drop it" kind="secondary" onPress={sender.dismiss} />
                </View>
              ) : (
                <Button label="OK" kind="secondary" onPress={sender.dismiss} />
              )}
            </View>
          ) : null}
          <StepView key={`${stepId}-${w.position.stepsTaken}`} walk={w} source={source} sender={sender} answers={availableAnswers(w.doc, stepId)} />
        </>
      )}
      <View style={styles.col}>
        <Button label={showHistory ? 'Hide the steps so far' : `Show the steps so far (${w.history.length})`} kind="secondary" onPress={() => setShowHistory((s) => !s)} testID="walk-history-toggle" />
        {showHistory ? <WalkHistory walk={w} /> : null}
      </View>
    </Screen>
  );
}

function WalkHeader({ walk }: { walk: WalkDetail }) {
  const job = walk.job;
  return (
    <View style={styles.header}>
      <Text style={styles.tree}>{walk.doc.title}</Text>
      {job ? (
        <Text style={styles.job}>{walkJobLine(job)}</Text>
      ) : null}
    </View>
  );
}

function Finished({ walk, source }: { walk: WalkDetail; source: WalkSource }) {
  return (
    <View style={styles.col} testID="walk-finished">
      <Notice tone="ok" title={`Walk finished: ${walk.walk.outcome ? WALK_OUTCOME_LABELS[walk.walk.outcome] : ''}`}>
        {[walk.walk.causeText ? `Cause: ${walk.walk.causeText}.` : 'No cause recorded.', walk.walk.finishNote ? `Done: ${walk.walk.finishNote}` : ''].filter(Boolean).join(' ')}
      </Notice>
      <Text style={styles.small}>{source.finishedNote ?? 'A finished walk is kept as it is; start a new walk from the job to look again.'}</Text>
      <View style={styles.row}>
        {source.links.report ? <Button label="Open the report" onPress={() => router.push(source.links.report as never)} testID="walk-open-report" /> : null}
        {source.links.job ? <Button label="Back to the job" kind="secondary" onPress={() => router.push(source.links.job as never)} testID="walk-to-job" /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  header: { gap: 2 },
  tree: { fontFamily: fonts.semibold, fontSize: 15, color: colors.accentDark },
  job: { ...type.small, color: colors.inkMuted },
  col: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  small: { ...type.small, color: colors.inkMuted },
});
