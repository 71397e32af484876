import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { WALK_OUTCOMES, WALK_OUTCOME_LABELS, type WalkOutcome } from '@/shared/schemas/walks';
import type { StepMeta } from '@/trees/tree-format';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { TextField } from '@/components/forms/text-field';
import { FormActions } from '@/components/forms/form-actions';
import { Button } from '@/components/button';
import { ApiError } from '@/hooks/api-client';
import { space } from '@/components/theme';

/** Closing a walk: the outcome, the cause (from the cause step, or in words), and what was done. */
export function FinishPanel({ meta, onFinish }: { meta: StepMeta; onFinish: (v: { outcome: WalkOutcome; causeText: string | null; note: string | null }) => Promise<unknown> }) {
  const atCause = meta.kind === 'cause';
  const [outcome, setOutcome] = useState<WalkOutcome | undefined>(atCause ? 'fixed' : meta.kind === 'refer' ? 'referred' : undefined);
  const [causeText, setCauseText] = useState('');
  const [note, setNote] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string>();
  const [busy, setBusy] = useState(false);

  const submit = async () => {
    if (!outcome) return setErrors({ outcome: 'Choose how the walk ended.' });
    if (outcome === 'fixed' && !atCause && !causeText.trim()) return setErrors({ causeText: 'Say what the cause was: this walk did not reach a cause step.' });
    setBusy(true);
    setErrors({});
    setFormError(undefined);
    try {
      await onFinish({ outcome, causeText: causeText.trim() || null, note: note.trim() || null });
    } catch (err) {
      if (err instanceof ApiError) {
        setErrors(err.fields);
        setFormError(err.message);
      } else setFormError('The walk was not finished. Try again.');
    } finally {
      setBusy(false);
    }
  };

  return (
    <View style={styles.wrap} testID="finish-panel">
      <SegmentedChoice<WalkOutcome>
        label="How did it end?"
        options={WALK_OUTCOMES.map((o) => ({ value: o, label: WALK_OUTCOME_LABELS[o] }))}
        value={outcome}
        onChange={setOutcome}
        error={errors.outcome}
        testID="finish-outcome"
      />
      <TextField
        label={atCause ? 'Cause in your words (optional)' : 'Cause found'}
        hint={atCause ? `Recorded as: ${meta.title}` : undefined}
        value={causeText}
        onChangeText={setCauseText}
        error={errors.causeText}
        testID="finish-cause"
      />
      <TextField label="What was done (optional)" value={note} onChangeText={setNote} multiline numberOfLines={3} error={errors.note} testID="finish-note" />
      <FormActions formError={formError} testID="finish">
        <Button label="Finish the walk" onPress={() => void submit()} busy={busy} testID="finish-submit" />
      </FormActions>
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.md } });
