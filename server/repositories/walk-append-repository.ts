import type { Knex } from 'knex';
import type { WalkRow, WalkStepRow } from './walk-repository';
import { stepRowsQuery, toStepRow, walkLockQuery } from './walk-repository';

/** What a mysql2 connection of the pool offers (only what is used here). */
interface RawConnection {
  query(options: { sql: string; values: unknown[] }, cb: (err: Error | null, results: unknown) => void): void;
  __knex__disposed?: unknown;
}

/** A knex query (built, never run by knex) or a bare SQL keyword. */
type Statement = { toSQL(): { toNative(): { sql: string; bindings: readonly unknown[] } } } | string;

/** Runs statements as one batch on the connection: one round trip, a result set each. */
function batch(conn: RawConnection, statements: Statement[]): Promise<unknown[]> {
  const parts = statements.map((s) => (typeof s === 'string' ? { sql: s, bindings: [] as unknown[] } : s.toSQL().toNative()));
  return new Promise((resolve, reject) => {
    conn.query({ sql: parts.map((p) => p.sql).join(';\n'), values: parts.flatMap((p) => [...p.bindings]) }, (err, results) => {
      if (err) return reject(err);
      resolve(statements.length === 1 ? [results] : (results as unknown[]));
    });
  });
}

/**
 * One answer's transaction on a walk, in as few round trips as the database
 * allows: `open` starts it, locks the walk and reads its steps (one batch);
 * `commit` writes the step, moves the walk on and commits (one batch). A step
 * is the app's busiest write, and on this stack each round trip costs more
 * than everything else the request does (the load benchmark's finding).
 * Needs `multipleStatements` on the pool (knexfile.ts); every value still goes
 * through the driver's escaping as a binding, never into the SQL text.
 */
export interface WalkAppend {
  walk: WalkRow;
  steps: WalkStepRow[];
  /** Runs one more read inside the transaction (rare: a tree version not yet in memory). */
  first<T>(query: Statement): Promise<T | undefined>;
  /** Writes the step, applies the walk's new position and commits. */
  commit(step: Statement, walkUpdate: Statement): Promise<void>;
  /** Ends the transaction without writing (a retry, a refusal). */
  end(): Promise<void>;
}

export function createWalkAppendRepository(knex: Knex) {
  const client = knex.client as unknown as { acquireConnection(): Promise<RawConnection>; releaseConnection(c: RawConnection): Promise<void> };

  /** Gives the connection back with no transaction left open on it; a connection that cannot say so is thrown away. */
  async function release(conn: RawConnection, rollback: boolean) {
    if (rollback) {
      try {
        await batch(conn, ['ROLLBACK']);
      } catch (err) {
        conn.__knex__disposed = err;
      }
    }
    await client.releaseConnection(conn);
  }

  return {
    /** Starts the transaction on a walk of the shop, locked until it ends; undefined (and nothing held) when there is no such walk. */
    async open(shopId: number, walkId: number): Promise<WalkAppend | undefined> {
      const conn = await client.acquireConnection();
      let results: unknown[];
      try {
        results = await batch(conn, ['START TRANSACTION', walkLockQuery(knex, shopId, walkId), stepRowsQuery(knex, walkId)]);
      } catch (err) {
        await release(conn, true);
        throw err;
      }
      const walk = (results[1] as WalkRow[])[0];
      if (!walk) {
        await release(conn, true);
        return undefined;
      }
      let done = false;
      const finish = async (rollback: boolean) => {
        if (done) return;
        done = true;
        await release(conn, rollback);
      };
      return {
        walk,
        steps: (results[2] as WalkStepRow[]).map(toStepRow),
        async first<T>(query: Statement) {
          const [rows] = await batch(conn, [query]);
          return (rows as T[])[0];
        },
        async commit(step, walkUpdate) {
          try {
            await batch(conn, [step, walkUpdate, 'COMMIT']);
          } catch (err) {
            // The batch stops at the failing statement: what ran before it is rolled back.
            await finish(true);
            throw err;
          }
          await finish(false);
        },
        end: () => finish(true),
      };
    },
  };
}
