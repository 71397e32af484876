/**
 * What a reading step's form holds and what the readings check makes of it,
 * computed in the browser as the tech types (the server judges again when the
 * reading is sent, with the same shared calculator).
 */
import { judgeReading, type ReadingJudgement } from '@/shared/readings/judge-reading';
import { ENGINE_PROFILES, PRESSURE_UNITS, type EngineProfile, type NeedleBehaviour, type PressureUnit, type ReadingParams, type Verdict } from '@/shared/readings/reading-kinds';
import { isPressureUnit } from '@/shared/readings/units';
import { parseNumberText } from '@/components/readings/number-text';
import type { WalkContext } from '@/trees/engine-types';

export interface ReadingDraft {
  text: string;
  unit: string;
  needle?: NeedleBehaviour;
  profile?: EngineProfile;
}

/** The units a step's reading may be typed in; the first is the default unless the shop prefers another. */
export function unitsFor(params: ReadingParams): readonly string[] {
  if (params.kind === 'fuel_trim') return ['%'];
  if (params.kind === 'idle_vacuum') return PRESSURE_UNITS;
  return isPressureUnit(params.unit) ? [params.unit, ...PRESSURE_UNITS.filter((u) => u !== params.unit)] : [params.unit];
}

/** A fresh draft: the shop's pressure unit for vacuum, the step's own unit otherwise. */
export function emptyDraft(params: ReadingParams, shopUnit: string): ReadingDraft {
  const units = unitsFor(params);
  const unit = params.kind === 'idle_vacuum' && (PRESSURE_UNITS as readonly string[]).includes(shopUnit) ? (shopUnit as PressureUnit) : units[0];
  return { text: '', unit, ...(params.kind === 'idle_vacuum' && !params.profile ? { profile: ENGINE_PROFILES[0] } : {}) };
}

export type DraftResult =
  | { kind: 'empty' }
  | { kind: 'invalid'; message: string }
  | { kind: 'judged'; verdict: Verdict; judgement: ReadingJudgement; event: { type: 'reading'; value: number; unit: string; needle?: NeedleBehaviour; profile?: EngineProfile } };

/** Judges the draft with the shared readings check: the verdict, its words, and the event to send. */
export function judgeDraft(params: ReadingParams, draft: ReadingDraft, ctx: WalkContext): DraftResult {
  const n = parseNumberText(draft.text);
  if (n.kind === 'empty') return { kind: 'empty' };
  if (n.kind === 'invalid') return { kind: 'invalid', message: n.message };
  const event = {
    type: 'reading' as const,
    value: n.value,
    unit: draft.unit,
    ...(draft.needle ? { needle: draft.needle } : {}),
    ...(draft.profile && params.kind === 'idle_vacuum' && !params.profile ? { profile: draft.profile } : {}),
  };
  try {
    const judgement = judgeReading(params, event, ctx);
    return { kind: 'judged', verdict: judgement.verdict, judgement, event };
  } catch (err) {
    return { kind: 'invalid', message: err instanceof Error ? err.message : 'That reading cannot be judged.' };
  }
}
