/** The full judgement of one or two banks' fuel trims at idle and about 2 500 rpm. */
import { ReadingError, formatNumber } from './errors';
import { cautionsFor, uniqueChecks, type Caution } from './cautions';
import { VERDICT_LABELS } from './verdict-labels';
import { likelyTrimCauses } from './fuel-trim-causes';
import {
  bankTrimPattern,
  judgeTrimPoint,
  patternDirection,
  trimScope,
  worstTrimVerdict,
  type BankTrimsPct,
  type FuelTrimVerdict,
  type TrimPattern,
  type TrimPointJudgement,
  type TrimScope,
} from './fuel-trim';

export interface FuelTrimsInput {
  bank1: BankTrimsPct;
  bank2?: BankTrimsPct;
}

export interface BankTrimJudgement {
  bank: 1 | 2;
  idle?: TrimPointJudgement;
  at2500?: TrimPointJudgement;
  pattern: TrimPattern;
}

export interface FuelTrimJudgement {
  verdict: FuelTrimVerdict;
  summary: string;
  banks: BankTrimJudgement[];
  /** The pattern that drives the causes: the first bank off normal, else bank 1's. */
  pattern: TrimPattern;
  scope: TrimScope;
  causes: Array<{ cause: string; reason: string }>;
  nextChecks: string[];
  cautions: Caution[];
}

export const PATTERN_LABELS: Readonly<Record<TrimPattern, string>> = {
  normal: 'Trims normal',
  unmetered_air: 'Lean at idle, better at 2 500 rpm: unmetered air',
  lean_all_speeds: 'Lean at all speeds: fuel supply, air-flow sensor or exhaust leak',
  lean_at_2500: 'Lean at 2 500 rpm only: supply or sensor falling behind',
  lean_speed_unknown: 'Lean; read the other speed to tell the cause',
  rich: 'Rich: too much fuel for the air',
  not_enough_readings: 'No trims entered',
};

const SCOPE_WORDS: Record<TrimScope, string> = {
  none: '',
  one_bank: ' One bank only.',
  both_banks: ' Both banks.',
  banks_disagree: ' The banks disagree (one lean, one rich).',
  single_bank_reported: '',
};

function judgeBank(bank: 1 | 2, input: BankTrimsPct): BankTrimJudgement {
  const field = `trims.bank${bank}`;
  const idle = input.idle ? judgeTrimPoint(input.idle, `${field}.idle`) : undefined;
  const at2500 = input.at2500 ? judgeTrimPoint(input.at2500, `${field}.at2500`) : undefined;
  return { bank, idle, at2500, pattern: bankTrimPattern(idle, at2500) };
}

/** Judges trims per bank: totals, verdicts, the pattern across speeds and banks, causes and next checks. */
export function judgeFuelTrims(input: FuelTrimsInput): FuelTrimJudgement {
  if (!input.bank1.idle && !input.bank1.at2500 && !input.bank2?.idle && !input.bank2?.at2500) {
    throw new ReadingError('trims', 'Enter short and long term trims for at least one bank at idle or at 2 500 rpm.');
  }
  const banks = [judgeBank(1, input.bank1), ...(input.bank2 ? [judgeBank(2, input.bank2)] : [])];
  const points = banks.flatMap((b) => [b.idle, b.at2500].filter((p): p is TrimPointJudgement => !!p));
  const verdict = worstTrimVerdict(points.map((p) => p.verdict));
  const scope = trimScope(banks.map((b) => b.pattern));
  const driver = banks.find((b) => patternDirection(b.pattern) === 'lean') ?? banks.find((b) => b.pattern === 'rich') ?? banks[0];
  const ranked = likelyTrimCauses(driver.pattern, scope, driver.bank);
  const checks = uniqueChecks(ranked.flatMap((c) => c.checks));

  const totals = banks
    .map((b) => {
      const parts = [b.idle && `idle ${signed(b.idle.totalPct)}`, b.at2500 && `2 500 rpm ${signed(b.at2500.totalPct)}`].filter(Boolean);
      return `bank ${b.bank} ${parts.join(', ')}`;
    })
    .join('; ');
  const summary = `${VERDICT_LABELS[verdict]}: total trims ${totals}. ${PATTERN_LABELS[driver.pattern]}.${SCOPE_WORDS[scope]}`;

  return {
    verdict,
    summary,
    banks,
    pattern: driver.pattern,
    scope,
    causes: ranked.map(({ cause, reason }) => ({ cause, reason })),
    nextChecks: checks.map((c) => c.text),
    cautions: cautionsFor(checks),
  };
}

/** A trim with its sign, e.g. "+12.5 %". */
export function signed(pct: number): string {
  return `${pct > 0 ? '+' : ''}${formatNumber(pct, 1)} %`;
}
