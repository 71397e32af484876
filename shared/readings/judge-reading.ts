/**
 * The one entry point the tree engine uses as its guard: judge a reading a
 * step asked for and return the verdict that picks the branch, with the words
 * and next checks to show. Throws ReadingError for impossible input.
 */
import type { EngineProfile, NeedleBehaviour, ReadingParams, Verdict } from './reading-kinds';
import { ReadingError, formatNumber, requireFinite } from './errors';
import { convertPressure, isPressureUnit, pressureUnitFrom } from './units';
import { cautionsFor, uniqueChecks, type Caution } from './cautions';
import { judgeIdleVacuum } from './vacuum-judgement';
import { CODE_TRIM_LIMIT_PCT, NORMAL_TRIM_LIMIT_PCT, fuelTrimVerdict, isLean, isRich } from './fuel-trim';
import { likelyTrimCauses } from './fuel-trim-causes';
import { VERDICT_LABELS } from './verdict-labels';

export interface ReadingInput {
  value: number;
  unit?: string;
  needle?: NeedleBehaviour;
  profile?: EngineProfile;
}

export interface ReadingContext {
  altitudeM?: number;
  baroKpa?: number;
}

export interface ReadingJudgement {
  verdict: Verdict;
  summary: string;
  expected?: { low: number; high: number; unit: string };
  causes?: Array<{ cause: string; reason: string }>;
  nextChecks?: string[];
  /** Safety notes for the next checks (a running engine, fuel under pressure, smoke testing). */
  cautions?: Caution[];
}

/** Judges one reading for a tree step: idle vacuum, one bank's total fuel trim, or a plain value against a band. */
export function judgeReading(params: ReadingParams, input: ReadingInput, ctx: ReadingContext = {}): ReadingJudgement {
  requireFinite(input.value, 'value', 'The reading');
  switch (params.kind) {
    case 'idle_vacuum': {
      const unit = pressureUnitFrom(input.unit, 'unit', 'inHg');
      const j = judgeIdleVacuum({ reading: 'vacuum', value: input.value, unit, profile: input.profile ?? params.profile, needle: input.needle }, ctx);
      return { verdict: j.verdict, summary: j.summary, expected: { low: j.expected.low, high: j.expected.high, unit }, causes: j.causes, nextChecks: j.nextChecks, cautions: j.cautions };
    }
    case 'fuel_trim':
      return judgeBankTotal(input, params.rpm ?? 'idle');
    case 'range':
      return judgeRange(params, input);
    default:
      throw new ReadingError('kind', `"${String((params as { kind: unknown }).kind)}" is not a reading kind; use idle_vacuum, fuel_trim or range.`);
  }
}

/** One bank's total trim at one speed; the speed decides which causes come first. */
function judgeBankTotal(input: ReadingInput, rpm: 'idle' | '2500'): ReadingJudgement {
  if (input.unit !== undefined && input.unit !== '%') throw new ReadingError('unit', `Fuel trims are in percent; "${input.unit}" is not allowed. Use %.`);
  const verdict = fuelTrimVerdict(input.value, 'value');
  const where = rpm === 'idle' ? 'at idle' : 'at about 2 500 rpm';
  const ranked = isLean(verdict)
    ? rpm === 'idle'
      ? [...likelyTrimCauses('unmetered_air', 'none'), ...likelyTrimCauses('lean_speed_unknown', 'none')]
      : [...likelyTrimCauses('lean_all_speeds', 'none'), ...likelyTrimCauses('lean_speed_unknown', 'none')]
    : isRich(verdict)
      ? likelyTrimCauses('rich', 'none')
      : [];
  const checks = uniqueChecks(ranked.flatMap((c) => c.checks));
  const code = verdict === 'code_lean' || verdict === 'code_rich' ? ` At ±${CODE_TRIM_LIMIT_PCT} % the engine computer usually sets a trouble code.` : '';
  return {
    verdict,
    summary: `${VERDICT_LABELS[verdict]}: total trim ${input.value > 0 ? '+' : ''}${formatNumber(input.value, 1)} % ${where}; within ±${NORMAL_TRIM_LIMIT_PCT} % is normal.${code}`,
    expected: { low: -NORMAL_TRIM_LIMIT_PCT, high: NORMAL_TRIM_LIMIT_PCT, unit: '%' },
    causes: ranked.map(({ cause, reason }) => ({ cause, reason })),
    nextChecks: checks.map((c) => c.text),
    cautions: cautionsFor(checks),
  };
}

/** A plain value against the step's band; ends count as within. Pressure units convert to the step's unit. */
function judgeRange(params: Extract<ReadingParams, { kind: 'range' }>, input: ReadingInput): ReadingJudgement {
  if (!(params.min <= params.max)) throw new ReadingError('params', `The step's band runs from ${params.min} to ${params.max}; its minimum must not be above its maximum.`);
  let value = input.value;
  if (input.unit !== undefined && input.unit !== params.unit) {
    if (!isPressureUnit(input.unit) || !isPressureUnit(params.unit)) {
      throw new ReadingError('unit', `This step is read in ${params.unit}; "${input.unit}" cannot be converted to it. Enter the value in ${params.unit}.`);
    }
    value = convertPressure(value, input.unit, params.unit, 'value');
  }
  const verdict = value < params.min ? 'below' : value > params.max ? 'above' : 'within';
  return {
    verdict,
    summary: `${VERDICT_LABELS[verdict]}: ${params.quantity} ${formatNumber(value, 3)} ${params.unit}, expected ${formatNumber(params.min, 3)} to ${formatNumber(params.max, 3)} ${params.unit}.`,
    expected: { low: params.min, high: params.max, unit: params.unit },
    causes: [],
    nextChecks: [],
  };
}
