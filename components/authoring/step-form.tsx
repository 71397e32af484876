import { useEffect, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { STEP_KINDS, STEP_KIND_LABELS, type StateDef, type StepKind, type TreeDoc } from '@/trees/tree-format';
import type { Finding } from '@/trees/engine-types';
import { TextField } from '@/components/forms/text-field';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { colors, radius, space, type } from '@/components/theme';
import { renameStep, setKind, setStep, stepIdProblem, type Doc } from './editor-model';
import { stepFieldErrors } from './field-errors';
import { MarkdownPreview } from './markdown-preview';
import { CautionsEditor, PromptsEditor } from './list-editors';
import { AnswersEditor, CauseFields, NextStepField, ReadingFields, ReferFields, type KindFieldsProps } from './kind-fields';
import { FindingList } from './findings-panel';

interface Props {
  doc: TreeDoc;
  id: string;
  findings: Finding[];
  update: (fn: (d: Doc) => Doc) => void;
  onSelect: (id: string) => void;
  /** Adds a step of a kind after this one and answers its id. */
  createStep: (kind: StepKind) => string;
}

/** The form for one step: fields for its kind, with messages from the format's schema and the validator's findings. */
export function StepForm({ doc, id, findings, update, onSelect, createStep }: Props) {
  const state = doc.machine.states[id];
  if (!state) return null;
  const meta = state.meta;
  const errors = stepFieldErrors(state);
  const setState = (next: StateDef) => update((d) => setStep(d, id, next));
  const setMeta = (patch: Partial<typeof meta>) => update((d) => setStep(d, id, { ...d.machine.states[id], meta: { ...d.machine.states[id].meta, ...patch } } as StateDef));
  const kindProps: KindFieldsProps = { doc, id, state, errors, setState, createStep, onOpen: onSelect };

  return (
    <View style={styles.form} testID="step-form">
      <Text style={styles.heading} accessibilityRole="header">
        {STEP_KIND_LABELS[meta.kind]} step · {meta.title || 'Untitled'}
      </Text>
      {findings.length ? <FindingList findings={findings} testID="step-findings" /> : null}
      <StepIdField key={id} doc={doc} id={id} onRename={(next) => (update((d) => renameStep(d, id, next)), onSelect(next))} />
      <SegmentedChoice
        label="Kind of step"
        options={STEP_KINDS.map((k) => ({ value: k, label: STEP_KIND_LABELS[k] }))}
        value={meta.kind}
        onChange={(k) => update((d) => setKind(d, id, k))}
        testID="step-kind"
      />
      <TextField label="Title" value={meta.title} onChangeText={(title) => setMeta({ title })} error={errors.title} testID="step-title" />
      <View style={styles.bodyRow}>
        <View style={styles.grow}>
          <TextField
            label="Text (markdown)"
            hint="**bold**, *italic*, lists with “- ”. Say how to do the check, safely."
            value={meta.body}
            onChangeText={(body) => setMeta({ body })}
            multiline
            error={errors.body}
            testID="step-body"
          />
        </View>
        <View style={styles.grow}>
          <MarkdownPreview markdown={meta.body} testID="step-preview" />
        </View>
      </View>
      <CautionsEditor value={meta.cautions} onChange={(cautions) => setMeta({ cautions })} errors={errors} testID="step-cautions" />
      <PromptsEditor value={meta.photoPrompts} onChange={(photoPrompts) => setMeta({ photoPrompts })} errors={errors} testID="step-prompts" />
      {meta.kind === 'ask' ? <AnswersEditor {...kindProps} /> : null}
      {meta.kind === 'action' ? <NextStepField {...kindProps} /> : null}
      {meta.kind === 'reading' ? <ReadingFields {...kindProps} /> : null}
      {meta.kind === 'cause' ? <CauseFields {...kindProps} /> : null}
      {meta.kind === 'refer' ? <ReferFields {...kindProps} /> : null}
    </View>
  );
}

/** The step id: renamed when the field is left, re-aiming every answer that led here. */
function StepIdField({ doc, id, onRename }: { doc: TreeDoc; id: string; onRename: (next: string) => void }) {
  const [text, setText] = useState(id);
  useEffect(() => setText(id), [id]);
  const problem = text === id ? undefined : stepIdProblem(doc, id, text.trim());
  return (
    <TextField
      label="Step id"
      hint="Used by answers to point here and counted in statistics; renaming re-aims every answer."
      value={text}
      autoCapitalize="none"
      autoCorrect={false}
      onChangeText={setText}
      onBlur={() => {
        const next = text.trim();
        if (next !== id && !stepIdProblem(doc, id, next)) onRename(next);
      }}
      error={problem}
      testID="step-id"
    />
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg, backgroundColor: colors.surface, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, padding: space.lg },
  heading: { ...type.heading, color: colors.ink },
  bodyRow: { gap: space.md },
  grow: { flex: 1, gap: space.xs },
});
