import { describe, expect, it } from 'vitest';
import { emptyDraft, judgeDraft, unitsFor } from './reading-draft';

describe('reading drafts on the walk screen', () => {
  it('offers percent only for fuel trims, and every pressure unit for vacuum with the shop unit first chosen', () => {
    expect(unitsFor({ kind: 'fuel_trim', rpm: 'idle' })).toEqual(['%']);
    expect(emptyDraft({ kind: 'idle_vacuum' }, 'kPa')).toEqual({ text: '', unit: 'kPa', profile: 'stock' });
    expect(unitsFor({ kind: 'range', quantity: 'Fuel rail pressure', unit: 'psi', min: 35, max: 65 })[0]).toBe('psi');
    expect(unitsFor({ kind: 'range', quantity: 'Battery', unit: 'V', min: 12, max: 15 })).toEqual(['V']);
  });

  it('judges a trim with the shared check: +18 % at idle is lean (common practice: beyond ±10 % is not normal)', () => {
    const r = judgeDraft({ kind: 'fuel_trim', rpm: 'idle' }, { text: '18', unit: '%' }, { altitudeM: 0 });
    expect(r.kind).toBe('judged');
    if (r.kind === 'judged') {
      expect(r.verdict).toBe('lean');
      expect(r.event).toEqual({ type: 'reading', value: 18, unit: '%' });
    }
  });

  it('accepts a decimal comma and explains text that is not a number', () => {
    const r = judgeDraft({ kind: 'range', quantity: 'Fuel rail pressure', unit: 'psi', min: 35, max: 65 }, { text: '40,5', unit: 'psi' }, {});
    expect(r.kind === 'judged' && r.verdict).toBe('within');
    const bad = judgeDraft({ kind: 'fuel_trim', rpm: 'idle' }, { text: 'lots', unit: '%' }, {});
    expect(bad.kind).toBe('invalid');
    expect(judgeDraft({ kind: 'fuel_trim', rpm: 'idle' }, { text: '  ', unit: '%' }, {}).kind).toBe('empty');
  });

  it('sends the engine profile only when the step leaves it to the tech', () => {
    const asked = judgeDraft({ kind: 'idle_vacuum' }, { text: '18', unit: 'inHg', profile: 'mild_cam' }, { altitudeM: 0 });
    expect(asked.kind === 'judged' && asked.event.profile).toBe('mild_cam');
    const fixed = judgeDraft({ kind: 'idle_vacuum', profile: 'stock' }, { text: '18', unit: 'inHg', profile: 'mild_cam' }, { altitudeM: 0 });
    expect(fixed.kind === 'judged' && fixed.event.profile).toBeUndefined();
  });
});
