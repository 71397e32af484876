import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { ReadingParams } from '@/shared/readings/reading-kinds';
import { ENGINE_PROFILES, NEEDLE_BEHAVIOURS, type EngineProfile, type NeedleBehaviour } from '@/shared/readings/reading-kinds';
import { PROFILE_LABELS } from '@/shared/readings/vacuum';
import type { AvailableAnswer, WalkContext } from '@/trees/engine-types';
import type { TreeDoc } from '@/trees/tree-format';
import { TextField } from '@/components/forms/text-field';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { UnitSelect } from '@/components/readings/unit-select';
import { VerdictBadge } from '@/components/readings/verdict-badge';
import { NEEDLE_LABELS } from '@/components/readings/air-engine-fields';
import { Button } from '@/components/button';
import { colors, fonts, radius, space, type } from '@/components/theme';
import { emptyDraft, judgeDraft, unitsFor, type DraftResult } from './reading-draft';

interface Props {
  doc: TreeDoc;
  params: ReadingParams;
  answer: AvailableAnswer;
  ctx: WalkContext;
  shopUnit: string;
  busy: boolean;
  onSubmit: (event: Extract<DraftResult, { kind: 'judged' }>['event'], words: string) => void;
}

/** A reading step: the value with its unit, the live verdict from the readings check, and where it leads. */
export function ReadingForm({ doc, params, answer, ctx, shopUnit, busy, onSubmit }: Props) {
  const [draft, setDraft] = useState(() => emptyDraft(params, shopUnit));
  const result = judgeDraft(params, draft, ctx);
  const units = unitsFor(params);
  const branch = result.kind === 'judged' ? answer.branches?.find((b) => b.verdict === result.verdict) : undefined;
  const target = branch ? doc.machine.states[branch.target]?.meta.title : undefined;

  return (
    <View style={styles.wrap} testID="reading-form">
      <Text style={styles.what}>{answer.label}</Text>
      <View style={styles.valueRow}>
        <View style={styles.grow}>
          <TextField
            label="Reading"
            value={draft.text}
            onChangeText={(text) => setDraft((d) => ({ ...d, text }))}
            keyboardType="numbers-and-punctuation"
            inputMode="decimal"
            placeholder={params.kind === 'fuel_trim' ? 'e.g. +12 or -4' : 'e.g. 18'}
            error={result.kind === 'invalid' ? result.message : undefined}
            testID="reading-value"
          />
        </View>
        {units.length > 1 ? (
          <View style={styles.unit}>
            <UnitSelect label="Unit" value={draft.unit} options={units} onChange={(unit) => setDraft((d) => ({ ...d, unit }))} testID="reading-unit" />
          </View>
        ) : (
          <Text style={styles.fixedUnit}>{units[0]}</Text>
        )}
      </View>
      {params.kind === 'idle_vacuum' && !params.profile ? (
        <SegmentedChoice<EngineProfile>
          label="Engine"
          options={ENGINE_PROFILES.map((p) => ({ value: p, label: PROFILE_LABELS[p] }))}
          value={draft.profile}
          onChange={(profile) => setDraft((d) => ({ ...d, profile }))}
          testID="reading-profile"
        />
      ) : null}
      {params.kind === 'idle_vacuum' ? (
        <SegmentedChoice<NeedleBehaviour | 'none'>
          label="Needle (optional)"
          options={[{ value: 'none', label: 'Not noted' }, ...NEEDLE_BEHAVIOURS.map((n) => ({ value: n, label: NEEDLE_LABELS[n] }))]}
          value={draft.needle ?? 'none'}
          onChange={(n) => setDraft((d) => ({ ...d, needle: n === 'none' ? undefined : n }))}
          testID="reading-needle"
        />
      ) : null}
      {result.kind === 'judged' ? (
        <View style={styles.verdict} testID="reading-verdict" accessibilityLiveRegion="polite">
          <VerdictBadge verdict={result.verdict} testID={`reading-verdict-${result.verdict}`} />
          <Text style={styles.summary}>{result.judgement.summary}</Text>
          {target ? (
            <Text style={styles.next} testID="reading-leads-to">
              Next step: {target}
            </Text>
          ) : null}
        </View>
      ) : null}
      <Button
        label="Record this reading"
        onPress={() => result.kind === 'judged' && onSubmit(result.event, `${draft.text.trim()} ${draft.unit}`)}
        disabled={result.kind !== 'judged'}
        busy={busy}
        testID="reading-submit"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  what: { ...type.subheading, color: colors.ink },
  valueRow: { flexDirection: 'row', alignItems: 'flex-end', gap: space.md },
  grow: { flex: 1 },
  unit: { paddingBottom: 0 },
  fixedUnit: { fontFamily: fonts.bold, fontSize: 20, color: colors.ink, paddingBottom: space.md },
  verdict: { gap: space.sm, padding: space.md, borderRadius: radius.md, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line },
  summary: { ...type.body, color: colors.ink },
  next: { fontFamily: fonts.bold, fontSize: 16, color: colors.accentDark },
});
