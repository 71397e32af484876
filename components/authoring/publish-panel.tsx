import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { Finding } from '@/trees/engine-types';
import { ApiError } from '@/hooks/api-client';
import { useDiscardDraft, usePublishDraft } from '@/hooks/use-tree-drafts';
import { TextField } from '@/components/forms/text-field';
import { CheckboxRow } from '@/components/jobs/checkbox-row';
import { Button } from '@/components/button';
import { Notice } from '@/components/notice';
import { colors, radius, space, type } from '@/components/theme';
import { FindingList } from './findings-panel';
import type { SaveStatus } from './use-draft-editor';

interface Props {
  treeId: number;
  version: number;
  findings: Finding[];
  status: SaveStatus;
  revision: () => number;
  onPublished: (version: number) => void;
  onDiscarded: () => void;
}

/** Publish (with a note, warnings read and accepted) or throw the draft away. */
export function PublishPanel({ treeId, version, findings, status, revision, onPublished, onDiscarded }: Props) {
  const [note, setNote] = useState('');
  const [accepted, setAccepted] = useState(false);
  const [refusal, setRefusal] = useState<{ message: string; findings: Finding[]; fields: Record<string, string> }>();
  const [confirmDiscard, setConfirmDiscard] = useState(false);
  const publish = usePublishDraft(treeId);
  const discard = useDiscardDraft(treeId);
  const errors = findings.filter((f) => f.severity === 'error');
  const warnings = findings.filter((f) => f.severity === 'warning');
  const blocked = errors.length > 0 ? 'Fix the problems listed above first.' : status !== 'saved' ? 'Waiting for the draft to save…' : undefined;

  const go = async () => {
    setRefusal(undefined);
    try {
      const answer = await publish.mutateAsync({ revision: revision(), note, acceptWarnings: accepted });
      onPublished(answer.version);
    } catch (err) {
      const e = err instanceof ApiError ? err : undefined;
      const details = e?.details as { findings?: Finding[] } | undefined;
      setRefusal({ message: e?.message ?? 'Publishing failed. Try again.', findings: details?.findings ?? [], fields: e?.fields ?? {} });
    }
  };

  return (
    <View style={styles.box} testID="publish-panel">
      <Text style={styles.head} accessibilityRole="header">
        Publish version {version}
      </Text>
      <Text style={styles.hint}>Walks already started keep the version they began with; new walks take this one.</Text>
      <TextField label="What changed in this version" placeholder="Added a check for a cracked booster hose" value={note} onChangeText={setNote} error={refusal?.fields.note} testID="publish-note" />
      {warnings.length ? <CheckboxRow label={`I have read the ${warnings.length === 1 ? 'warning' : `${warnings.length} warnings`} and publish anyway`} checked={accepted} onChange={setAccepted} testID="publish-accept-warnings" /> : null}
      {refusal ? (
        <Notice tone="error" title="Not published" testID="publish-error">
          <View style={styles.col}>
            <Text style={styles.text}>{refusal.message}</Text>
            {refusal.findings.length ? <FindingList findings={refusal.findings} /> : null}
          </View>
        </Notice>
      ) : null}
      {blocked ? <Text style={styles.hint} testID="publish-blocked">{blocked}</Text> : null}
      <View style={styles.row}>
        <Button label="Publish" onPress={() => void go()} busy={publish.isPending} disabled={!!blocked || (warnings.length > 0 && !accepted)} testID="publish-submit" />
        <Button label="Discard the draft…" kind="secondary" onPress={() => setConfirmDiscard(true)} testID="discard-draft" />
      </View>
      {confirmDiscard ? (
        <Notice tone="caution" title="Throw this draft away?">
          <View style={styles.col}>
            <Text style={styles.text}>Every change in it is lost. The published version stays as it is.</Text>
            <View style={styles.row}>
              <Button label="Discard the draft" kind="danger" busy={discard.isPending} onPress={() => discard.mutate(undefined, { onSuccess: onDiscarded })} testID="discard-confirm" />
              <Button label="Keep editing" kind="secondary" onPress={() => setConfirmDiscard(false)} />
            </View>
            {discard.error ? <Text style={styles.text}>{discard.error.message}</Text> : null}
          </View>
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md, padding: space.lg, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  head: { ...type.heading, color: colors.ink },
  hint: { ...type.small, color: colors.inkMuted },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  col: { gap: space.sm },
  text: { ...type.body, color: colors.ink },
});
