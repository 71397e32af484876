import { useDeferredValue, useMemo, useState, type ReactNode } from 'react';
import { ActivityIndicator, Platform, Pressable, StyleSheet, Text, View, useWindowDimensions } from 'react-native';
import { Link, useRouter } from 'expo-router';
import type { Draft } from '@/shared/schemas/tree-authoring';
import { validateTree } from '@/trees/validate';
import type { StepKind } from '@/trees/tree-format';
import { ApiError } from '@/hooks/api-client';
import { useDraft, useStartDraft } from '@/hooks/use-tree-drafts';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Notice } from '@/components/notice';
import { Button } from '@/components/button';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { colors, fonts, space, touchTarget, type, wideBreakpoint } from '@/components/theme';
import { addStep, deleteStep, duplicateStep, moveStep } from './editor-model';
import { findingsByStep } from './field-errors';
import { FindingsSummary } from './findings-panel';
import { StepListPanel } from './step-list-panel';
import { StepForm } from './step-form';
import { TreeGraph } from './tree-graph';
import { TreeDetailsForm } from './tree-details-form';
import { PublishPanel } from './publish-panel';
import { useDraftEditor, type SaveStatus } from './use-draft-editor';
import { useLeaveGuard } from './use-leave-guard';

/** /trees/:id/edit: the tree's draft, or a way to start one. */
export function TreeEditor({ treeId }: { treeId: number }) {
  const draft = useDraft(treeId);
  const start = useStartDraft(treeId);
  const back = (
    <Link href={`/trees/${treeId}`} asChild>
      <Pressable accessibilityRole="link" style={styles.back} testID="editor-back">
        <Text style={styles.backText}>‹ Back to the tree</Text>
      </Pressable>
    </Link>
  );
  if (draft.data) return <DraftEditor key={`${draft.data.versionId}-${draft.data.revision}`} draft={draft.data} back={back} reload={() => void draft.refetch()} />;
  const missing = draft.error instanceof ApiError && draft.error.status === 404;
  return (
    <Screen testID="tree-editor">
      {back}
      {draft.isPending && draft.fetchStatus !== 'idle' ? (
        <View style={styles.row}>
          <ActivityIndicator color={colors.accent} />
          <ThemedText muted>Opening the draft…</ThemedText>
        </View>
      ) : missing ? (
        <View style={styles.col} testID="no-draft">
          <Notice tone="info" title="No draft yet">
            This tree has no draft. Start one from the published version: walks keep using the published version until you publish the draft.
          </Notice>
          <Button label="Start a new draft" onPress={() => start.mutate()} busy={start.isPending} testID="start-draft" />
          {start.error ? <Notice tone="error">{start.error.message}</Notice> : null}
        </View>
      ) : (
        <Notice tone="error" title="Could not open the draft">
          {draft.error?.message ?? 'That tree was not found.'}
        </Notice>
      )}
    </Screen>
  );
}

const STATUS_WORDS: Record<SaveStatus, string> = {
  saved: '✔ All changes saved',
  unsaved: '● Unsaved changes (saving shortly)',
  saving: '… Saving',
  failed: '✖ Not saved',
  conflict: '✖ Not saved: someone else saved first',
};

function DraftEditor({ draft, back, reload }: { draft: Draft; back: ReactNode; reload: () => void }) {
  const router = useRouter();
  const { width } = useWindowDimensions();
  const wide = width >= wideBreakpoint;
  const editor = useDraftEditor(draft.treeId, draft);
  const { doc, update } = editor;
  const checked = useDeferredValue(doc);
  const findings = useMemo(() => validateTree(checked).findings, [checked]);
  const byStep = useMemo(() => findingsByStep(findings), [findings]);
  const [selected, setSelected] = useState<string | undefined>(wide ? doc.machine.initial : undefined);
  const [view, setView] = useState<'list' | 'graph'>('list');

  useLeaveGuard(
    editor.status === 'conflict'
      ? 'Your latest changes were not saved because someone else saved this draft first. Leave and lose them?'
      : editor.dirty
        ? 'Some changes are not saved yet. Leave anyway? Baywalk will still try to save them.'
        : undefined,
  );

  const createStep = (kind: StepKind) => {
    let id = '';
    update((d) => {
      const r = addStep(d, kind, { afterId: selected });
      id = r.id;
      return r.doc;
    });
    return id;
  };
  const select = (id: string) => setSelected(id);

  const list = (
    <StepListPanel
      doc={doc}
      selected={selected}
      findings={byStep}
      onSelect={select}
      onAdd={(kind) => select(createStep(kind))}
      onMove={(id, delta) => update((d) => moveStep(d, id, delta))}
      onDuplicate={(id) => {
        let copy = '';
        update((d) => {
          const r = duplicateStep(d, id);
          copy = r.id;
          return r.doc;
        });
        select(copy);
      }}
      onDelete={(id) => {
        update((d) => deleteStep(d, id));
        setSelected(undefined);
      }}
    />
  );
  const form = selected && doc.machine.states[selected] ? (
    <StepForm doc={doc} id={selected} findings={byStep.get(selected) ?? []} update={update} onSelect={select} createStep={createStep} />
  ) : (
    <Notice tone="info" title="Choose a step">Pick a step from the list to edit it.</Notice>
  );

  return (
    <Screen testID="tree-editor">
      {back}
      <View style={styles.col}>
        <ThemedText variant="title" accessibilityRole="header">
          {doc.title || 'Untitled tree'}
        </ThemedText>
        <Text style={styles.muted}>
          Draft of version {draft.version}
          {draft.publishedVersion ? ` (replaces version ${draft.publishedVersion} when published)` : ' (not published yet)'}
        </Text>
        <View style={styles.row}>
          <Text style={[styles.status, (editor.status === 'failed' || editor.status === 'conflict') && styles.statusBad]} testID="save-status" accessibilityLiveRegion="polite">
            {STATUS_WORDS[editor.status]}
          </Text>
          {editor.status === 'failed' ? <Button label="Try again" kind="secondary" onPress={() => void editor.saveNow()} testID="save-retry" /> : null}
        </View>
      </View>
      {editor.status === 'conflict' ? (
        <Notice tone="error" title="Your changes were not saved" testID="save-conflict">
          <View style={styles.col}>
            <Text style={styles.body}>{editor.message}</Text>
            <View style={styles.row}>
              <Button label="Load the saved draft" onPress={reload} testID="conflict-reload" />
              {Platform.OS === 'web' ? <Button label="Download my copy first" kind="secondary" onPress={() => downloadJson(doc, `${draft.slug}-my-copy.json`)} /> : null}
            </View>
          </View>
        </Notice>
      ) : editor.status === 'failed' && editor.message ? (
        <Notice tone="error" title="Not saved yet">
          {editor.message}
        </Notice>
      ) : null}
      <FindingsSummary findings={findings} onOpen={select} />
      <TreeDetailsForm doc={doc} update={update} createStep={createStep} />
      {wide ? (
        <SegmentedChoice label="Show the steps as" options={[{ value: 'list', label: 'List' }, { value: 'graph', label: 'Graph' }]} value={view} onChange={setView} testID="editor-view" />
      ) : null}
      {wide && view === 'graph' ? (
        <>
          <TreeGraph doc={doc} selected={selected} findings={byStep} onSelect={select} />
          {form}
        </>
      ) : wide ? (
        <View style={styles.columns}>
          <View style={styles.listCol}>{list}</View>
          <View style={styles.formCol}>{form}</View>
        </View>
      ) : selected ? (
        <>
          <Pressable accessibilityRole="button" onPress={() => setSelected(undefined)} style={styles.back} testID="back-to-steps">
            <Text style={styles.backText}>‹ All steps</Text>
          </Pressable>
          {form}
        </>
      ) : (
        list
      )}
      <PublishPanel
        treeId={draft.treeId}
        version={draft.version}
        findings={findings}
        status={editor.status}
        revision={editor.revision}
        onPublished={() => router.replace(`/trees/${draft.treeId}`)}
        onDiscarded={() => router.replace(`/trees/${draft.treeId}`)}
      />
    </Screen>
  );
}

/** Offers a JSON document as a file download (web). */
function downloadJson(value: unknown, name: string) {
  const url = URL.createObjectURL(new Blob([JSON.stringify(value, null, 2)], { type: 'application/json' }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  a.click();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

const styles = StyleSheet.create({
  back: { minHeight: touchTarget, justifyContent: 'center', alignSelf: 'flex-start' },
  backText: { fontFamily: fonts.semibold, fontSize: 17, color: colors.accentDark },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
  col: { gap: space.sm },
  muted: { ...type.small, color: colors.inkMuted },
  body: { ...type.body, color: colors.ink },
  status: { fontFamily: fonts.semibold, fontSize: 15, color: colors.ok },
  statusBad: { color: colors.danger },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: space.lg },
  listCol: { flex: 2 },
  formCol: { flex: 3 },
});
