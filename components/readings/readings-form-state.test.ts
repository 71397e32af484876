import { describe, expect, it } from 'vitest';
import { parseNumberText } from './number-text';
import { initialFormState, toCheckInput } from './readings-form-state';

describe('parseNumberText', () => {
  it('reads numbers with a point or comma, signs and the typographic minus', () => {
    expect(parseNumberText(' 18.5 ')).toEqual({ kind: 'number', value: 18.5 });
    expect(parseNumberText('18,5')).toEqual({ kind: 'number', value: 18.5 });
    expect(parseNumberText('\u221212')).toEqual({ kind: 'number', value: -12 });
    expect(parseNumberText('+3')).toEqual({ kind: 'number', value: 3 });
    expect(parseNumberText('.5')).toEqual({ kind: 'number', value: 0.5 });
    expect(parseNumberText('')).toEqual({ kind: 'empty' });
  });
  it('refuses text that is not a number, and overflow', () => {
    expect(parseNumberText('18 inHg')).toMatchObject({ kind: 'invalid', message: expect.stringMatching(/not a number/) });
    expect(parseNumberText('1e5')).toMatchObject({ kind: 'invalid' });
    expect(parseNumberText('9'.repeat(400))).toMatchObject({ kind: 'invalid', message: expect.stringMatching(/too large/) });
  });
});

describe('Readings form state', () => {
  it('defaults to sea level and inHg with altitude in feet when the shop is unknown', () => {
    const s = initialFormState();
    expect(s).toMatchObject({ altitudeText: '0', altitudeUnit: 'ft', vacuumUnit: 'inHg', baroUnit: 'inHg', profile: 'stock' });
  });
  it("takes the shop's altitude and unit: kPa shops get metres", () => {
    expect(initialFormState({ altitudeM: 1609, pressureUnit: 'kPa' })).toMatchObject({ altitudeText: '1609', altitudeUnit: 'm', vacuumUnit: 'kPa' });
    expect(initialFormState({ altitudeM: 1609, pressureUnit: 'inHg' })).toMatchObject({ altitudeText: '5279', altitudeUnit: 'ft' });
  });
  it('translates text into the check input and says when there is nothing to judge', () => {
    const s = initialFormState();
    expect(toCheckInput(s).hasReading).toBe(false);
    s.vacuumText = '18';
    s.needle = 'steady';
    expect(toCheckInput(s)).toEqual({
      input: { profile: 'stock', needle: 'steady', altitude: { value: 0, unit: 'ft' }, vacuum: { value: 18, unit: 'inHg' } },
      errors: {},
      hasReading: true,
    });
  });
  it('uses MAP and a measured barometer when picked, and asks for the barometer when it is empty', () => {
    const s = { ...initialFormState(), airSource: 'baro' as const, vacuumSource: 'map' as const, vacuumText: '40', vacuumUnit: 'kPa' as const };
    expect(toCheckInput(s).errors.baro).toMatch(/Enter the barometric pressure/);
    s.baroText = '29.5';
    expect(toCheckInput(s).input).toMatchObject({ baro: { value: 29.5, unit: 'inHg' }, map: { value: 40, unit: 'kPa' } });
  });
  it('keys unreadable text and half trim pairs by the same fields the check uses', () => {
    const s = initialFormState();
    s.vacuumText = 'abc';
    s.trims.bank1.idle = { shortText: '12', longText: '' };
    s.trims.bank1.at2500 = { shortText: '', longText: '4' };
    s.trims.bank2.idle = { shortText: '5', longText: '5' }; // ignored: one bank only
    const t = toCheckInput(s);
    expect(Object.keys(t.errors).sort()).toEqual(['trims.bank1.at2500.shortPct', 'trims.bank1.idle.longPct', 'vacuum']);
    expect(t.hasReading).toBe(false);
    s.twoBanks = true;
    expect(toCheckInput(s).input.trims).toEqual({ bank2: { idle: { shortPct: 5, longPct: 5 } } });
  });
});
