import { describe, expect, it } from 'vitest';
import { judgeFuelTrims, signed } from './fuel-trim-judgement';
import { likelyTrimCauses } from './fuel-trim-causes';

const pair = (shortPct: number, longPct: number) => ({ shortPct, longPct });

describe('judgeFuelTrims', () => {
  it('refuses an empty set of trims', () => {
    expect(() => judgeFuelTrims({ bank1: {} })).toThrow(expect.objectContaining({ field: 'trims' }));
  });

  it('names the exact bad field', () => {
    expect(() => judgeFuelTrims({ bank1: { idle: pair(0, 0) }, bank2: { at2500: pair(150, 0) } })).toThrow(
      expect.objectContaining({ field: 'trims.bank2.at2500.shortPct' }),
    );
  });

  it('all normal: no causes, no checks, no cautions', () => {
    const j = judgeFuelTrims({ bank1: { idle: pair(2, 3), at2500: pair(-1, 2) } });
    expect(j).toMatchObject({ verdict: 'normal', pattern: 'normal', scope: 'none', causes: [], nextChecks: [], cautions: [] });
    expect(j.summary).toBe('Normal: total trims bank 1 idle +5 %, 2 500 rpm +1 %. Trims normal.');
  });

  it('a code-level lean idle on one bank leads with unmetered air and that bank, with smoke and running cautions', () => {
    const j = judgeFuelTrims({ bank1: { idle: pair(12, 14), at2500: pair(3, 4) }, bank2: { idle: pair(1, 1), at2500: pair(0, 1) } });
    expect(j.verdict).toBe('code_lean');
    expect(j.banks[0].idle?.totalPct).toBe(26);
    expect(j.scope).toBe('one_bank');
    expect(j.causes.map((c) => c.cause)[1]).toMatch(/^A cause on bank 1/);
    expect(j.cautions.map((c) => c.kind)).toEqual(['running_engine', 'smoke_test']);
    expect(j.summary).toMatch(/One bank only\.$/);
  });

  it('lean at all speeds asks for fuel pressure, with the fuel-pressure caution', () => {
    const j = judgeFuelTrims({ bank1: { idle: pair(8, 8), at2500: pair(8, 7) } });
    expect(j.pattern).toBe('lean_all_speeds');
    expect(j.cautions.map((c) => c.kind)).toContain('fuel_pressure');
    expect(j.scope).toBe('single_bank_reported');
  });

  it('banks that disagree point at swapped oxygen sensor connectors', () => {
    const j = judgeFuelTrims({ bank1: { idle: pair(-9, -8) }, bank2: { idle: pair(9, 8) } });
    expect(j.scope).toBe('banks_disagree');
    expect(j.pattern).toBe('lean_speed_unknown'); // the lean bank drives the causes
    expect(j.causes.at(-1)?.cause).toMatch(/swapped/);
  });

  it('rich on both banks gives the rich pattern and shared causes', () => {
    const j = judgeFuelTrims({ bank1: { idle: pair(-10, -8) }, bank2: { idle: pair(-12, -6) } });
    expect(j).toMatchObject({ verdict: 'rich', pattern: 'rich', scope: 'both_banks' });
    expect(j.causes.at(-1)?.cause).toMatch(/both banks share: fuel pressure/);
  });

  it('one bank rich names that bank', () => {
    const j = judgeFuelTrims({ bank1: { idle: pair(0, 0) }, bank2: { idle: pair(-20, -10) } });
    expect(j.causes.at(-1)?.cause).toMatch(/bank 2: a leaking injector/);
  });

  it('bank 2 only still judges', () => {
    const j = judgeFuelTrims({ bank1: {}, bank2: { at2500: pair(6, 8) } });
    expect(j.banks[1].pattern).toBe('lean_speed_unknown');
    expect(j.scope).toBe('one_bank');
  });

  it('every pattern with a direction has causes; normal and empty have none', () => {
    for (const p of ['unmetered_air', 'lean_all_speeds', 'lean_at_2500', 'lean_speed_unknown', 'rich'] as const) {
      expect(likelyTrimCauses(p, 'none').length).toBeGreaterThan(0);
    }
    expect(likelyTrimCauses('normal', 'none')).toEqual([]);
    expect(likelyTrimCauses('not_enough_readings', 'none')).toEqual([]);
  });

  it('formats signed percentages', () => {
    expect(signed(12.345)).toBe('+12.3 %');
    expect(signed(-4)).toBe('-4 %');
    expect(signed(0)).toBe('0 %');
  });
});
