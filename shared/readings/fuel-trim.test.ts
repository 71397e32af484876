import { describe, expect, it } from 'vitest';
import {
  TRIM_PCT_MAX,
  bankTrimPattern,
  fuelTrimVerdict,
  judgeTrimPoint,
  requireTrimPct,
  totalTrimPct,
  trimScope,
  worstTrimVerdict,
  type TrimPointJudgement,
} from './fuel-trim';

const point = (totalPct: number): TrimPointJudgement => judgeTrimPoint({ shortPct: totalPct / 2, longPct: totalPct / 2 }, 't');

describe('fuel trim verdict boundaries (±10 % and ±25 %, common practice)', () => {
  const cases: Array<[number, string]> = [
    [0, 'normal'],
    [10, 'normal'],
    [10.01, 'lean'],
    [24.99, 'lean'],
    [25, 'code_lean'],
    [198.4375, 'code_lean'],
    [-10, 'normal'],
    [-10.01, 'rich'],
    [-24.99, 'rich'],
    [-25, 'code_rich'],
    [-200, 'code_rich'],
  ];
  for (const [total, verdict] of cases) it(`${total} % → ${verdict}`, () => expect(fuelTrimVerdict(total)).toBe(verdict));

  it('refuses a total no two trims can add up to, and NaN', () => {
    expect(() => fuelTrimVerdict(198.5)).toThrowError(/−200 to \+198\.44 %/);
    expect(() => fuelTrimVerdict(-200.1)).toThrowError(/impossible/);
    expect(() => fuelTrimVerdict(Number.NaN)).toThrowError(/must be a number/);
  });
});

describe('single trims', () => {
  it('accept −100 to +99.21875 % and refuse beyond, naming the short or long field', () => {
    expect(requireTrimPct(-100, 'x')).toBe(-100);
    expect(requireTrimPct(TRIM_PCT_MAX, 'x')).toBe(99.21875);
    expect(() => requireTrimPct(99.3, 'x')).toThrowError(/−100 to \+99\.22 %/);
    expect(() => totalTrimPct(120, 0, 'trims.bank1.idle')).toThrow(expect.objectContaining({ field: 'trims.bank1.idle.shortPct' }));
    expect(() => totalTrimPct(0, -101, 'trims.bank1.idle')).toThrow(expect.objectContaining({ field: 'trims.bank1.idle.longPct' }));
  });
});

describe('bank pattern, every branch', () => {
  it('not enough readings when neither speed was read', () => expect(bankTrimPattern()).toBe('not_enough_readings'));
  it('normal when nothing is off', () => expect(bankTrimPattern(point(5), point(-5))).toBe('normal'));
  it('unmetered air when lean at idle and normal at 2 500 rpm', () => expect(bankTrimPattern(point(15), point(8))).toBe('unmetered_air'));
  it('unmetered air when still lean at 2 500 but at most half the idle total (boundary: exactly half)', () => {
    expect(bankTrimPattern(point(30), point(15))).toBe('unmetered_air');
    expect(bankTrimPattern(point(30), point(15.5))).toBe('lean_all_speeds');
  });
  it('lean at all speeds when 2 500 rpm stays more than half as lean', () => expect(bankTrimPattern(point(20), point(18))).toBe('lean_all_speeds'));
  it('lean at 2 500 only when idle is normal', () => expect(bankTrimPattern(point(2), point(14))).toBe('lean_at_2500'));
  it('lean with the speed unknown when only one speed was read', () => {
    expect(bankTrimPattern(point(14))).toBe('lean_speed_unknown');
    expect(bankTrimPattern(undefined, point(14))).toBe('lean_speed_unknown');
  });
  it('rich when rich at either speed and lean at none', () => {
    expect(bankTrimPattern(point(-14), point(0))).toBe('rich');
    expect(bankTrimPattern(undefined, point(-30))).toBe('rich');
  });
});

describe('scope across banks, every branch', () => {
  it('none, one bank, both banks, banks that disagree, single bank reported', () => {
    expect(trimScope(['normal', 'normal'])).toBe('none');
    expect(trimScope(['normal'])).toBe('none');
    expect(trimScope(['unmetered_air', 'normal'])).toBe('one_bank');
    expect(trimScope(['not_enough_readings', 'rich'])).toBe('one_bank');
    expect(trimScope(['unmetered_air', 'lean_all_speeds'])).toBe('both_banks');
    expect(trimScope(['rich', 'rich'])).toBe('both_banks');
    expect(trimScope(['rich', 'lean_at_2500'])).toBe('banks_disagree');
    expect(trimScope(['lean_speed_unknown'])).toBe('single_bank_reported');
  });
  it('the worst verdict puts codes first and lean before rich', () => {
    expect(worstTrimVerdict(['normal', 'rich', 'lean'])).toBe('lean');
    expect(worstTrimVerdict(['code_rich', 'lean'])).toBe('code_rich');
    expect(worstTrimVerdict(['code_rich', 'code_lean'])).toBe('code_lean');
    expect(worstTrimVerdict([])).toBe('normal');
  });
});
