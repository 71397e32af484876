import type { Knex } from 'knex';

export interface AnswerCountRow {
  from_step: string;
  /** The verdict for a reading step, else the event type (`answer.yes`, `done`). */
  answer: string;
  n: number;
}

export interface CauseCountRow {
  cause_step: string;
  cause_code: string;
  n: number;
  median_steps: number | null;
  median_seconds: number | null;
}

export interface EndingsRow {
  total: number;
  finished: number;
  open: number;
  to_cause: number;
  to_refer: number;
  unfinished: number;
}

/**
 * Step statistics of one tree, aggregated by MariaDB (GROUP BY and the
 * MEDIAN window function) so no walk is loaded into memory. Scoped by shop;
 * `versionId` narrows to walks pinned to one version.
 */
export function createTreeStatsRepository(knex: Knex) {
  const walkFilter = (shopId: number, treeId: number, versionId?: number) => {
    const args: number[] = [shopId, treeId];
    let sql = 'w.shop_id = ? AND w.tree_id = ?';
    if (versionId) {
      sql += ' AND w.tree_version_id = ?';
      args.push(versionId);
    }
    return { sql, args };
  };
  const num = (v: unknown) => (v === null || v === undefined ? null : Number(v));

  return {
    /** How often each answer or verdict was taken at each step, in finished walks; answers later undone are left out. */
    async answerCounts(shopId: number, treeId: number, versionId?: number): Promise<AnswerCountRow[]> {
      const f = walkFilter(shopId, treeId, versionId);
      const [rows] = await knex.raw(
        `SELECT s.from_step, COALESCE(s.verdict, JSON_UNQUOTE(JSON_EXTRACT(s.event, '$.type'))) AS answer, COUNT(*) AS n
           FROM walk_steps s
           JOIN walks w ON w.id = s.walk_id AND w.shop_id = s.shop_id
          WHERE ${f.sql} AND w.status = 'finished' AND s.kind = 'event'
            AND NOT EXISTS (SELECT 1 FROM walk_steps u WHERE u.walk_id = s.walk_id AND u.kind = 'undo' AND u.undoes_step_id = s.id)
          GROUP BY s.from_step, answer
          ORDER BY s.from_step, n DESC, answer`,
        f.args,
      );
      return (rows as AnswerCountRow[]).map((r) => ({ ...r, n: Number(r.n) }));
    },

    /** Finished walks that reached each cause step, with the median answers and seconds of work it took. */
    async causeCounts(shopId: number, treeId: number, versionId?: number): Promise<CauseCountRow[]> {
      const f = walkFilter(shopId, treeId, versionId);
      const [rows] = await knex.raw(
        `SELECT DISTINCT w.cause_step, w.cause_code,
                COUNT(*) OVER (PARTITION BY w.cause_step, w.cause_code) AS n,
                MEDIAN(w.step_count) OVER (PARTITION BY w.cause_step, w.cause_code) AS median_steps,
                MEDIAN(w.time_spent_s) OVER (PARTITION BY w.cause_step, w.cause_code) AS median_seconds
           FROM walks w
          WHERE ${f.sql} AND w.status = 'finished' AND w.cause_code IS NOT NULL
          ORDER BY n DESC, w.cause_step`,
        f.args,
      );
      return (rows as CauseCountRow[]).map((r) => ({ ...r, n: Number(r.n), median_steps: num(r.median_steps), median_seconds: num(r.median_seconds) }));
    },

    /** Median answers and seconds over every finished walk that reached a cause step. */
    async toCauseMedians(shopId: number, treeId: number, versionId?: number): Promise<{ median_steps: number | null; median_seconds: number | null }> {
      const f = walkFilter(shopId, treeId, versionId);
      const [rows] = await knex.raw(
        `SELECT MEDIAN(w.step_count) OVER () AS median_steps, MEDIAN(w.time_spent_s) OVER () AS median_seconds
           FROM walks w
          WHERE ${f.sql} AND w.status = 'finished' AND w.cause_code IS NOT NULL
          LIMIT 1`,
        f.args,
      );
      const r = (rows as Array<{ median_steps: unknown; median_seconds: unknown }>)[0];
      return { median_steps: num(r?.median_steps), median_seconds: num(r?.median_seconds) };
    },

    /** How walks of the tree ended: at a cause, at a refer step, closed before either, or still open. */
    async endings(shopId: number, treeId: number, versionId?: number): Promise<EndingsRow> {
      const f = walkFilter(shopId, treeId, versionId);
      const [rows] = await knex.raw(
        `SELECT COUNT(*) AS total,
                COALESCE(SUM(w.status = 'finished'), 0) AS finished,
                COALESCE(SUM(w.status = 'open'), 0) AS open,
                COALESCE(SUM(w.status = 'finished' AND w.cause_code IS NOT NULL), 0) AS to_cause,
                COALESCE(SUM(w.status = 'finished' AND w.cause_step IS NOT NULL AND w.cause_code IS NULL), 0) AS to_refer,
                COALESCE(SUM(w.status = 'finished' AND w.cause_step IS NULL), 0) AS unfinished
           FROM walks w
          WHERE ${f.sql}`,
        f.args,
      );
      const r = (rows as Array<Record<keyof EndingsRow, unknown>>)[0];
      return {
        total: Number(r.total),
        finished: Number(r.finished),
        open: Number(r.open),
        to_cause: Number(r.to_cause),
        to_refer: Number(r.to_refer),
        unfinished: Number(r.unfinished),
      };
    },
  };
}

export type TreeStatsRepository = ReturnType<typeof createTreeStatsRepository>;
