import { useEffect, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { ENGINE_PROFILES, READING_KINDS, VERDICTS, type ReadingKind, type ReadingParams } from '@/shared/readings/reading-kinds';
import { PROFILE_LABELS } from '@/shared/readings/vacuum';
import { VERDICT_LABELS } from '@/shared/readings/verdict-labels';
import type { StateDef, StepKind, TreeDoc } from '@/trees/tree-format';
import { TextField } from '@/components/forms/text-field';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { Button } from '@/components/button';
import { colors, radius, space, type } from '@/components/theme';
import { answerEventFor, answersOf, branchesOf, nextOf, withAnswers, withBranches, withNext, withReadingKind } from './editor-model';
import { StepTargetPicker } from './step-target-picker';
import { RemoveButton } from './list-editors';

export interface KindFieldsProps {
  doc: TreeDoc;
  id: string;
  state: StateDef;
  errors: Record<string, string>;
  setState: (next: StateDef) => void;
  /** Adds a new step of a kind and returns its id (the caller aims an answer at it). */
  createStep: (kind: StepKind) => string;
  onOpen: (id: string) => void;
}

const READING_KIND_LABELS: Record<ReadingKind, string> = { idle_vacuum: 'Idle vacuum', fuel_trim: 'Fuel trim', range: 'A value in a range' };

/** An ask step's answers: each a button label and the step it leads to. */
export function AnswersEditor({ doc, id, state, setState, createStep, onOpen }: KindFieldsProps) {
  const rows = answersOf(state);
  const [label, setLabel] = useState('');
  const [labelError, setLabelError] = useState<string>();
  const add = () => {
    const words = label.trim();
    if (!words) return setLabelError('Write the words on the answer button first.');
    if (rows.some((r) => r.label.trim().toLowerCase() === words.toLowerCase())) return setLabelError('Another answer already has these words.');
    setState(withAnswers(state, [...rows, { event: answerEventFor(state, words), label: words, target: '' }]));
    setLabel('');
    setLabelError(undefined);
  };
  const setRow = (i: number, patch: Partial<(typeof rows)[number]>) => setState(withAnswers(state, rows.map((r, j) => (j === i ? { ...r, ...patch } : r))));
  return (
    <View style={styles.section} testID="answers-editor">
      <Text style={styles.head}>Answers</Text>
      {rows.length === 0 ? <Text style={styles.hint}>No answers yet: a technician at this step would be stuck.</Text> : null}
      {rows.map((r, i) => (
        <View key={r.event} style={styles.card} testID={`answer-${r.event}`}>
          <TextField label={`Answer ${i + 1}: button words`} value={r.label} onChangeText={(t) => setRow(i, { label: t })} error={r.label.trim() ? undefined : 'Write the words on the button.'} testID={`answer-${r.event}-label`} />
          <StepTargetPicker
            doc={doc}
            fromId={id}
            value={r.target}
            label="Leads to"
            onChange={(target) => setRow(i, { target })}
            onCreate={(kind) => setRow(i, { target: createStep(kind) })}
            onOpen={onOpen}
            error={r.target && doc.machine.states[r.target] ? undefined : 'Choose the step this answer leads to.'}
            testID={`answer-${r.event}-target`}
          />
          <RemoveButton label={`Remove the answer ${r.label}`} onPress={() => setState(withAnswers(state, rows.filter((_, j) => j !== i)))} testID={`answer-${r.event}-remove`} />
        </View>
      ))}
      <View style={styles.card}>
        <TextField label="New answer: button words" placeholder="e.g. Yes, it is split" value={label} onChangeText={(t) => (setLabel(t), setLabelError(undefined))} onSubmitEditing={add} error={labelError} testID="new-answer-label" />
        <Button label="Add the answer" kind="secondary" onPress={add} testID="new-answer-add" />
      </View>
    </View>
  );
}

/** An action step's one way on ("done"). */
export function NextStepField({ doc, id, state, setState, createStep, onOpen }: KindFieldsProps) {
  const next = nextOf(state);
  return (
    <View style={styles.section}>
      <StepTargetPicker
        doc={doc}
        fromId={id}
        value={next}
        label="When done, go to (usually a re-test)"
        onChange={(t) => setState(withNext(state, t))}
        onCreate={(kind) => setState(withNext(state, createStep(kind)))}
        onOpen={onOpen}
        error={next && doc.machine.states[next] ? undefined : 'Choose the step that follows.'}
        testID="action-next"
      />
    </View>
  );
}

/** A reading step: what is measured, its parameters, and the step each verdict leads to. */
export function ReadingFields({ doc, id, state, errors, setState, createStep, onOpen }: KindFieldsProps) {
  if (state.meta.kind !== 'reading') return null;
  const reading = state.meta.reading;
  const setReading = (r: ReadingParams) => setState({ ...state, meta: { ...state.meta, reading: r } } as StateDef);
  const targets = branchesOf(state);
  const setTarget = (verdict: string, target: string) => setState(withBranches(state, { ...branchesOf(state), [verdict]: target }));
  return (
    <View style={styles.section} testID="reading-fields">
      <SegmentedChoice
        label="Reading"
        options={READING_KINDS.map((k) => ({ value: k, label: READING_KIND_LABELS[k] }))}
        value={reading.kind}
        onChange={(k) => setState(withReadingKind(state, k))}
        testID="reading-kind"
      />
      {reading.kind === 'fuel_trim' ? (
        <SegmentedChoice label="Engine speed" options={[{ value: 'idle', label: 'Idle' }, { value: '2500', label: '2 500 rpm' }]} value={reading.rpm} onChange={(rpm) => setReading({ ...reading, rpm })} testID="reading-rpm" />
      ) : null}
      {reading.kind === 'idle_vacuum' ? (
        <SegmentedChoice
          label="Engine profile"
          hint="Leave on “Ask during the walk” to let the technician say."
          options={[{ value: 'ask', label: 'Ask during the walk' }, ...ENGINE_PROFILES.map((p) => ({ value: p, label: PROFILE_LABELS[p] }))]}
          value={reading.profile ?? 'ask'}
          onChange={(p) => setReading(p === 'ask' ? { kind: 'idle_vacuum' } : { kind: 'idle_vacuum', profile: p })}
          testID="reading-profile"
        />
      ) : null}
      {reading.kind === 'range' ? (
        <>
          <TextField label="What is measured" placeholder="Fuel rail pressure, key on engine off" value={reading.quantity} onChangeText={(quantity) => setReading({ ...reading, quantity })} error={errors['reading.quantity'] && 'Say what is measured.'} testID="reading-quantity" />
          <TextField label="Unit" placeholder="psi" value={reading.unit} onChangeText={(unit) => setReading({ ...reading, unit })} error={errors['reading.unit'] && 'Give the unit.'} testID="reading-unit" />
          <View style={styles.pair}>
            <NumberField label="Lowest good value" value={reading.min} onChange={(min) => setReading({ ...reading, min })} testID="reading-min" />
            <NumberField label="Highest good value" value={reading.max} onChange={(max) => setReading({ ...reading, max })} testID="reading-max" />
          </View>
          {reading.min > reading.max ? <Text style={styles.error}>✖ The lowest value is above the highest.</Text> : null}
        </>
      ) : null}
      <Text style={styles.head}>Where each verdict leads</Text>
      {(VERDICTS[reading.kind] as readonly string[]).map((v) => (
        <StepTargetPicker
          key={v}
          doc={doc}
          fromId={id}
          value={targets[v] ?? ''}
          label={`When “${VERDICT_LABELS[v as keyof typeof VERDICT_LABELS]}”`}
          onChange={(t) => setTarget(v, t)}
          onCreate={(kind) => setTarget(v, createStep(kind))}
          onOpen={onOpen}
          error={targets[v] && doc.machine.states[targets[v]] ? undefined : 'Choose where this verdict leads.'}
          testID={`verdict-${v}`}
        />
      ))}
    </View>
  );
}

/** A number typed as text: kept as typed while it is not yet a number. */
function NumberField({ label, value, onChange, testID }: { label: string; value: number; onChange: (n: number) => void; testID: string }) {
  const [text, setText] = useState(String(value));
  useEffect(() => {
    if (Number(text) !== value) setText(String(value));
    // Only follow outside changes (another step selected), not our own typing.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [value]);
  const bad = text.trim() === '' || !Number.isFinite(Number(text));
  return (
    <View style={styles.grow}>
      <TextField
        label={label}
        value={text}
        keyboardType="decimal-pad"
        onChangeText={(t) => {
          setText(t);
          if (t.trim() !== '' && Number.isFinite(Number(t))) onChange(Number(t));
        }}
        error={bad ? 'Type a number.' : undefined}
        testID={testID}
      />
    </View>
  );
}

/** A cause step: the cause code counted across jobs, the part or area, and the fix. */
export function CauseFields({ state, errors, setState }: KindFieldsProps) {
  if (state.meta.kind !== 'cause') return null;
  const cause = state.meta.cause;
  const set = (patch: Partial<typeof cause>) => setState({ ...state, meta: { ...state.meta, cause: { ...cause, ...patch } } } as StateDef);
  return (
    <View style={styles.section} testID="cause-fields">
      <TextField label="Cause code" hint="Lower-case words and hyphens; the same code counts as the same cause across trees and jobs." placeholder="vacuum-hose-split" value={cause.code} autoCapitalize="none" onChangeText={(code) => set({ code })} error={errors['cause.code']} testID="cause-code" />
      <TextField label="Part or area" placeholder="Brake booster hose" value={cause.area} onChangeText={(area) => set({ area })} error={errors['cause.area']} testID="cause-area" />
      <TextField label="Fix" placeholder="Replace the hose and clamp both ends." value={cause.fix} multiline onChangeText={(fix) => set({ fix })} error={errors['cause.fix']} testID="cause-fix" />
    </View>
  );
}

/** A refer step: who to hand over to, and why. */
export function ReferFields({ state, errors, setState }: KindFieldsProps) {
  if (state.meta.kind !== 'refer') return null;
  const refer = state.meta.refer;
  const set = (patch: Partial<typeof refer>) => setState({ ...state, meta: { ...state.meta, refer: { ...refer, ...patch } } } as StateDef);
  return (
    <View style={styles.section} testID="refer-fields">
      <TextField label="Hand over to" placeholder="Calibration specialist" value={refer.to} onChangeText={(to) => set({ to })} error={errors['refer.to']} testID="refer-to" />
      <TextField label="Why" value={refer.reason} multiline onChangeText={(reason) => set({ reason })} error={errors['refer.reason']} testID="refer-reason" />
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.md },
  head: { ...type.subheading, color: colors.ink },
  hint: { ...type.small, color: colors.inkMuted },
  card: { gap: space.sm, padding: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.paper },
  pair: { flexDirection: 'row', gap: space.md },
  grow: { flex: 1 },
  error: { ...type.small, color: colors.danger },
});
