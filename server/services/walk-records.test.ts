import { describe, expect, it } from 'vitest';
import type { WalkStepRow } from '../repositories/walk-repository';
import { MAX_COUNTED_GAP_S, effectiveSteps, liveEvents, timeSpentSeconds } from './walk-records';

const row = (id: string, seq: number, kind: 'event' | 'undo', type = 'done'): WalkStepRow => ({
  id, seq, kind, walk_id: 1, shop_id: 1, event: kind === 'event' ? { type } : null, undoes_step_id: null, from_step: 'a', to_step: 'b',
  verdict: null, reading_value: null, reading_unit: null, judgement: null, note: null, user_id: null, created_at: new Date(0),
});

describe('walk records', () => {
  it('replays only answers still in force: each undo takes back the latest one', () => {
    const steps = [row('1', 1, 'event', 'answer.a'), row('2', 2, 'event', 'answer.b'), row('3', 3, 'undo'), row('4', 4, 'event', 'answer.c'), row('5', 5, 'undo'), row('6', 6, 'undo')];
    const { live, undone } = effectiveSteps(steps);
    expect(live).toEqual([]);
    expect([...undone]).toEqual(['2', '4', '1']);
    expect(liveEvents(steps.slice(0, 4))).toEqual([{ type: 'answer.a' }, { type: 'answer.c' }]);
  });

  it('counts time between start, steps and finish, capping long pauses', () => {
    const t = (s: number) => new Date(Date.UTC(2026, 0, 1) + s * 1000);
    expect(timeSpentSeconds(t(0), [t(60), t(150)], t(200))).toBe(200);
    // An overnight pause counts as one capped gap.
    expect(timeSpentSeconds(t(0), [t(60), t(60 + 12 * 3600)], t(60 + 12 * 3600 + 30))).toBe(60 + MAX_COUNTED_GAP_S + 30);
  });
});
