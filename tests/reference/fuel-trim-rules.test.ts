import { describe, expect, it } from 'vitest';
import { CODE_TRIM_LIMIT_PCT, NORMAL_TRIM_LIMIT_PCT, fuelTrimVerdict, judgeFuelTrims } from '@/shared/readings';

// Every rule in this file is common practice, no published source (REFERENCES §7): the regulations set
// emissions-based criteria, not a trim percentage.
describe('fuel trim thresholds (common practice, no published source)', () => {
  it('total trim within about ±10 % is normal', () => {
    expect(NORMAL_TRIM_LIMIT_PCT).toBe(10);
    expect(fuelTrimVerdict(9)).toBe('normal');
    expect(fuelTrimVerdict(-9)).toBe('normal');
  });
  it('a lean or rich code is usually set near ±25 % total', () => {
    expect(CODE_TRIM_LIMIT_PCT).toBe(25);
    expect(fuelTrimVerdict(26)).toBe('code_lean');
    expect(fuelTrimVerdict(-26)).toBe('code_rich');
  });
});

describe('fuel trim patterns (common practice, no published source)', () => {
  it('lean at idle that improves at 2 000–2 500 rpm: unmetered air', () => {
    const j = judgeFuelTrims({ bank1: { idle: { shortPct: 10, longPct: 12 }, at2500: { shortPct: 2, longPct: 3 } } });
    expect(j.pattern).toBe('unmetered_air');
    expect(j.causes[0].cause).toMatch(/unmetered air/i);
  });
  it('lean at all speeds: fuel supply, an air-flow sensor reading low, or an exhaust leak ahead of the oxygen sensor', () => {
    const j = judgeFuelTrims({ bank1: { idle: { shortPct: 8, longPct: 10 }, at2500: { shortPct: 7, longPct: 10 } } });
    expect(j.pattern).toBe('lean_all_speeds');
    const causes = j.causes.map((c) => c.cause).join(' | ');
    expect(causes).toMatch(/fuel supply/i);
    expect(causes).toMatch(/air-flow sensor reading low/i);
    expect(causes).toMatch(/exhaust leak ahead of the oxygen sensor/i);
  });
  it('one bank lean: a cause on that bank (intake gasket or port, injector seal, its oxygen sensor)', () => {
    const j = judgeFuelTrims({
      bank1: { idle: { shortPct: 2, longPct: 1 }, at2500: { shortPct: 1, longPct: 0 } },
      bank2: { idle: { shortPct: 9, longPct: 11 }, at2500: { shortPct: 2, longPct: 2 } },
    });
    expect(j.scope).toBe('one_bank');
    expect(j.causes.map((c) => c.cause).join(' | ')).toMatch(/bank 2: intake gasket or port, injector seal/);
  });
  it('both banks lean: a shared cause (plenum, throttle-body gasket, vacuum hose, PCV, brake booster line, fuel supply, air-flow sensor)', () => {
    const j = judgeFuelTrims({
      bank1: { idle: { shortPct: 9, longPct: 11 }, at2500: { shortPct: 2, longPct: 2 } },
      bank2: { idle: { shortPct: 8, longPct: 12 }, at2500: { shortPct: 1, longPct: 3 } },
    });
    expect(j.scope).toBe('both_banks');
    expect(j.causes.map((c) => c.cause).join(' | ')).toMatch(/plenum, throttle-body gasket, vacuum hose, PCV, brake booster line, fuel supply or air-flow sensor/);
  });
});
