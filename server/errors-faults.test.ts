import { describe, expect, it } from 'vitest';
import { translateError } from './errors';

// Found by the database crash test (tests/scripts/crash-database.test.ts): both answered 500.
describe('translateError for faults seen while the database dies and comes back', () => {
  it('a fatal driver error without an errno (ROLLBACK on a dropped connection) is "database unavailable"', () => {
    const err = Object.assign(new Error("ROLLBACK - Can't add new command when connection is in closed state"), { fatal: true });
    expect(translateError(err)).toMatchObject({ status: 503, code: 'database_unavailable' });
  });

  it('a deadlock or lock wait timeout is a 503 that says nothing was saved, so a retry is safe', () => {
    for (const errno of [1213, 1205]) {
      const t = translateError(Object.assign(new Error('Deadlock found when trying to get lock'), { errno }));
      expect(t).toMatchObject({ status: 503, code: 'busy' });
      expect(t!.message).toMatch(/Nothing from this request was saved; try again/);
    }
  });

  it('other driver errors are left to the 500 handler', () => {
    expect(translateError(Object.assign(new Error('syntax'), { errno: 1064 }))).toBeUndefined();
  });
});
