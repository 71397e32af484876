/// <reference types="node" />
/**
 * Times every Patterns query on the benchmark database made by
 * scripts/patterns-bigdata.ts, and prints each one's EXPLAIN plan.
 * A benchmark, not a test: it prints figures and marks the ones over the
 * 300 ms target; it never fails a build.
 *
 *   npm run bench:patterns           # BAYWALK_BENCH_DB picks another database
 */
import { Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import knexFactory, { type Knex } from 'knex';
import { knexSettings } from '@/knexfile';
import { loadConfig } from '@/server/config';
import {
  causesQuery,
  comebacksQuery,
  drillCountQuery,
  drillQuery,
  repeatsQuery,
  timesQuery,
  totalsQuery,
  unresolvedQuery,
  weeksQuery,
  type PatternScope,
} from '@/server/repositories/pattern-queries';
import { createPatternRepository } from '@/server/repositories/pattern-repository';
import { createPatternService, mondayOf, resolveFilters } from '@/server/services/pattern-service';
import { csvLine } from '@/server/http/csv';
import { exportColumns } from '@/server/services/pattern-export';

const DB = process.env.BAYWALK_BENCH_DB ?? 'baywalk_bench';
const RUNS = Number(process.env.BENCH_RUNS ?? 5);
const TARGET_MS = 300;

async function timed(fn: () => Promise<unknown>): Promise<{ median: number; max: number; rows: number }> {
  await fn(); // warm the buffer pool and the plan
  const times: number[] = [];
  let rows = 0;
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    const out = await fn();
    times.push(performance.now() - t0);
    rows = Array.isArray(out) ? out.length : out ? 1 : 0;
  }
  times.sort((a, b) => a - b);
  return { median: times[Math.floor(times.length / 2)], max: times.at(-1)!, rows };
}

async function explain(knex: Knex, q: Knex.QueryBuilder): Promise<string> {
  const { sql, bindings } = q.toSQL().toNative();
  const [rows] = (await knex.raw(`EXPLAIN ${sql}`, bindings as readonly unknown[] as never)) as unknown as [Array<Record<string, unknown>>];
  return rows
    .map((r) => `    ${String(r.id).padEnd(3)}${String(r.select_type).padEnd(20)}${String(r.table).padEnd(16)}${String(r.type).padEnd(8)}${String(r.key ?? '-').padEnd(30)}rows=${String(r.rows).padEnd(8)}${r.Extra ?? ''}`)
    .join('\n');
}

async function main() {
  const knex = knexFactory(knexSettings({ ...loadConfig().db, database: DB }));
  try {
    const [[big]] = (await knex.raw('SELECT shop_id, COUNT(*) AS n FROM walks GROUP BY shop_id ORDER BY n DESC LIMIT 1')) as unknown as [[{ shop_id: number; n: number }]];
    const [[all]] = (await knex.raw('SELECT (SELECT COUNT(*) FROM walks) AS walks, (SELECT COUNT(*) FROM walk_steps) AS steps')) as unknown as [[{ walks: number; steps: number }]];
    const shopId = big.shop_id;
    const repo = createPatternRepository(knex);
    const windowDays = await repo.windowDays(shopId);
    const tech = (await knex('users').where({ shop_id: shopId, role: 'tech' }).first('id')).id as number;
    const tree = (await knex('trees').where({ shop_id: shopId, slug: 'lean-after-intake-manifold' }).first('id')).id as number;
    const last = (await knex('walks').where({ shop_id: shopId }).max({ at: 'finished_at' }).first())!.at as Date;
    const today = new Date(last);
    console.log(`Patterns benchmark on ${DB}: ${all.walks} walks, ${all.steps} step records; shop ${shopId} has ${big.n} walks. ${RUNS} runs each after one warm-up; median / max in ms.\n`);

    const long = { from: new Date(today.getTime() - 727 * 86_400_000).toISOString().slice(0, 10), to: today.toISOString().slice(0, 10) };
    const filters: Array<[string, object]> = [
      ['install type', { installType: 'intake_manifold' }],
      ['technician', { techId: tech }],
      ['tree', { treeId: tree }],
      ['make and engine', { make: 'Ford', engine: '5.0 L V8' }],
    ];
    // Every single filter over both ranges: the join order of some queries depends on the range and the filters.
    const scopes: Array<[string, PatternScope]> = [
      ['26 weeks', resolveFilters(shopId, {}, today).scope],
      ['104 weeks', resolveFilters(shopId, long, today).scope],
      ...filters.map(([n, f]): [string, PatternScope] => [`26 weeks, ${n}`, resolveFilters(shopId, f, today).scope]),
      ...filters.map(([n, f]): [string, PatternScope] => [`104 weeks, ${n}`, resolveFilters(shopId, { ...long, ...f }, today).scope]),
    ];
    const queries: Array<[string, (s: PatternScope) => Knex.QueryBuilder]> = [
      ['totals', (s) => totalsQuery(knex, s)],
      ['causes found', (s) => causesQuery(knex, s)],
      ['repeat causes', (s) => repeatsQuery(knex, s)],
      ['comebacks', (s) => comebacksQuery(knex, s, windowDays)],
      ['referred / not fixed', (s) => unresolvedQuery(knex, s)],
      ['time and steps (percentiles)', (s) => timesQuery(knex, s)],
      ['weekly trend', (s) => weeksQuery(knex, s, mondayOf(s.start))],
      ['drill-down (a cause, 200 walks)', (s) => drillQuery(knex, s, { measure: 'cause', code: 'port-left-open' }).limit(200)],
      ['drill-down count', (s) => drillCountQuery(knex, s, { measure: 'cause', code: 'port-left-open' })],
    ];
    const slow: string[] = [];
    const header = `${'query'.padEnd(34)}${scopes.map(([n]) => n.padStart(28)).join('')}`;
    console.log(header);
    for (const [name, build] of queries) {
      const cells: string[] = [];
      for (const [scopeName, scope] of scopes) {
        const t = await timed(async () => build(scope));
        if (t.max > TARGET_MS) slow.push(`${name} (${scopeName}): max ${t.max.toFixed(0)} ms`);
        cells.push(`${t.median.toFixed(1)} / ${t.max.toFixed(1)} (${t.rows} rows)`.padStart(28));
      }
      console.log(name.padEnd(34) + cells.join(''));
    }

    const service = createPatternService(knex);
    const extra: Array<[string, () => Promise<unknown>]> = [
      ['whole report, 26 weeks (in parallel)', () => service.report(shopId, {}, today)],
      ['picker options', () => service.options(shopId)],
      ['cause titles', () => repo.causeTitles(shopId)],
      [
        'CSV of every walk, 104 weeks (streamed)',
        async () => {
          const s = scopes[1][1];
          const cols = exportColumns('walks', { title: () => null, firstMonday: mondayOf(s.start) });
          let bytes = 0;
          await pipeline(
            repo.stream('walks', s, { windowDays, firstMonday: mondayOf(s.start) }),
            new Writable({ objectMode: true, write: (row, _e, done) => ((bytes += csvLine(cols.map((c) => c.value(row))).length), done()) }),
          );
          return bytes;
        },
      ],
    ];
    console.log('');
    for (const [name, fn] of extra) {
      const t = await timed(fn);
      console.log(`${name.padEnd(44)}${t.median.toFixed(1).padStart(9)} / ${t.max.toFixed(1)} ms`);
    }

    console.log('\nEXPLAIN (26 weeks, no filter; install-type and make filters where they change the plan):');
    for (const [name, build] of queries) {
      console.log(`\n  ${name}`);
      console.log(await explain(knex, build(scopes[0][1])));
    }
    console.log('\n  comebacks, 104 weeks (starts from the returning VINs)');
    console.log(await explain(knex, comebacksQuery(knex, scopes[1][1], windowDays)));
    for (const [name, i] of [['causes found, install type', 2], ['causes found, make and engine', 5]] as const) {
      console.log(`\n  ${name}`);
      console.log(await explain(knex, causesQuery(knex, scopes[i][1])));
    }
    console.log(slow.length ? `\nOver ${TARGET_MS} ms:\n  ${slow.join('\n  ')}` : `\nEvery query answered under ${TARGET_MS} ms.`);
  } finally {
    await knex.destroy();
  }
}

main().catch((err) => {
  console.error(`bench: failed: ${err.message} (run "npm run bench:patterns:data" first)`);
  process.exit(1);
});
