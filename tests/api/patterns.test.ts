import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../support/test-app';
import { agent, createShopWithPeople, signedIn, type TestShop } from '../support/people';
import { installStockTrees } from '@/server/services/tree-stock';
import { seedDemoHistory } from '@/server/seeds/demo-history';

/** Patterns over HTTP: who may see it, filter refusals, and the streamed CSV exports. */
const t = createTestApp();
const RANGE = 'from=2026-03-02&to=2026-03-29';

/** Splits CSV text into records and fields (RFC 4180: quoted fields may hold commas, quotes and line breaks). */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') (field += '"'), i++;
      else if (c === '"') quoted = false;
      else field += c;
    } else if (c === '"') quoted = true;
    else if (c === ',') row.push(field), (field = '');
    else if (c === '\r' && text[i + 1] === '\n') {
      row.push(field), rows.push(row), (row = []), (field = ''), i++;
    } else field += c;
  }
  if (field || row.length) row.push(field), rows.push(row);
  return rows;
}

describe('Patterns API', () => {
  let shop: TestShop;
  let demo: TestShop;

  beforeAll(async () => {
    shop = await createShopWithPeople(t.knex, 'Patterns API');
    await installStockTrees(t.knex, shop.shopId);
    const tree = await t.knex('trees').where({ shop_id: shop.shopId, slug: 'lean-after-intake-manifold' }).first('id', 'published_version_id');
    const job = async (ro: string, install: string) => {
      const [id] = await t.knex('jobs').insert({ shop_id: shop.shopId, ro_number: ro, customer_name: 'Test', vin: '1FA6P8CF5G5212345', make: 'Ford', engine: '5.0 L V8' });
      await t.knex('job_changes').insert({ job_id: id, shop_id: shop.shopId, position: 0, install_type: install });
      return id as number;
    };
    const walk = (jobId: number, cause: string | null, outcome: string, text: string | null, finished: string) =>
      t.knex('walks').insert({
        shop_id: shop.shopId, job_id: jobId, tree_id: tree.id, tree_version_id: tree.published_version_id, started_by: shop.people.tech.id,
        status: 'finished', current_step: cause ?? 'trim-idle', step_count: 4, outcome, cause_step: cause, cause_code: cause, cause_text: text,
        finished_by: shop.people.tech.id, time_spent_s: 1200, started_at: new Date(`${finished}T08:00:00Z`), finished_at: new Date(`${finished}T09:00:00Z`),
      });
    // Text a spreadsheet would run as a formula, and text that needs quoting.
    const j1 = await job('=SUM(A1:A9)', 'intake_manifold');
    const j2 = await job('RO-2', 'throttle_body');
    await walk(j1, 'port-left-open', 'fixed', 'Port left open', '2026-03-03');
    await walk(j2, null, 'not_fixed', 'Hose split, "main" line\n(see photo)', '2026-03-10');
    await walk(j2, 'port-left-open', 'fixed', '@cmd|calc', '2026-03-12');

    demo = await createShopWithPeople(t.knex, 'Patterns API demo');
    await installStockTrees(t.knex, demo.shopId);
    await seedDemoHistory(t.knex, demo.shopId, { now: new Date('2026-06-01T12:00:00Z') });
  });
  afterAll(() => t.close());

  const paths = ['/api/patterns', '/api/patterns/options', `/api/patterns/walks?measure=finished&${RANGE}`, `/api/patterns/export/causes.csv?${RANGE}`];

  it('lets owners and leads in, refuses technicians and support with 403 and strangers with 401', async () => {
    for (const path of paths) {
      expect((await agent(t.app).get(path)).status, path).toBe(401);
      for (const role of ['owner', 'lead'] as const) expect((await (await signedIn(t.app, shop.people[role].email)).get(path)).status, `${role} ${path}`).toBe(200);
      for (const role of ['tech', 'support'] as const) {
        const res = await (await signedIn(t.app, shop.people[role].email)).get(path);
        expect(res.status, `${role} ${path}`).toBe(403);
        expect(res.body.error.code).toBe('forbidden');
      }
    }
  });

  it('answers the report for the range, defaulting to the last 26 weeks', async () => {
    const owner = await signedIn(t.app, shop.people.owner.email);
    const res = await owner.get(`/api/patterns?${RANGE}`);
    expect(res.body.totals).toMatchObject({ finished: 3, withCause: 2, fixed: 2, notFixed: 1 });
    expect(res.body.causes).toEqual([{ code: 'port-left-open', title: 'Port left open', walks: 2, share: 2 / 3 }]);
    const dflt = await owner.get('/api/patterns');
    const days = (Date.parse(dflt.body.filters.to) - Date.parse(dflt.body.filters.from)) / 86_400_000;
    expect(days).toBe(181);
    expect(dflt.body.weeks.length).toBeGreaterThanOrEqual(26);
  });

  it('refuses bad filters with a message naming the field', async () => {
    const owner = await signedIn(t.app, shop.people.owner.email);
    const cases: Array<[string, string, string]> = [
      ['from=2026-02-30', 'from', 'does not exist'],
      ['from=2026-03-10&to=2026-03-01', 'to', 'before the start'],
      ['from=2020-01-01&to=2026-01-01', 'from', 'shorter than'],
      ['installType=turbo', 'installType', 'install type'],
      ['treeId=abc', 'treeId', 'tree'],
    ];
    for (const [qs, field, words] of cases) {
      const res = await owner.get(`/api/patterns?${qs}`);
      expect(res.status, qs).toBe(400);
      expect(res.body.error.details.fields[field], qs).toContain(words);
    }
    const drill = await owner.get(`/api/patterns/walks?measure=cause&${RANGE}`);
    expect(drill.status).toBe(400);
    expect(drill.body.error.details.fields.code).toBe('Say which cause to open.');
    const csv = await owner.get('/api/patterns/export/causes.csv?to=yesterday');
    expect(csv.status).toBe(400);
    expect(csv.headers['content-type']).toContain('application/json');
  });

  it('streams a CSV of each table with the filters applied, a file name and safe cells', async () => {
    const lead = await signedIn(t.app, shop.people.lead.email);
    const res = await lead.get(`/api/patterns/export/walks.csv?${RANGE}`).buffer(true).parse((r, cb) => {
      let text = '';
      r.on('data', (c: Buffer) => (text += c.toString('utf8')));
      r.on('end', () => cb(null, text));
    });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe('attachment; filename="baywalk-walks-2026-03-02-to-2026-03-29.csv"');
    // Streamed: sent in chunks, no length known up front.
    expect(res.headers['transfer-encoding']).toBe('chunked');
    expect(res.headers['content-length']).toBeUndefined();
    const rows = parseCsv(res.body as string);
    expect(rows[0]).toEqual(['walk_id', 'ro', 'vin', 'vehicle', 'engine', 'tree', 'technician', 'outcome', 'cause_code', 'cause', 'steps', 'minutes', 'started_at', 'finished_at']);
    expect(rows.length).toBe(4);
    const byRo = new Map(rows.slice(1).map((r) => [r[1], r]));
    // Formula-looking text starts with an apostrophe; commas, quotes and line breaks survive quoting.
    expect(byRo.get("'=SUM(A1:A9)")).toBeDefined();
    expect(rows.find((r) => r[9].startsWith('Hose'))?.[9]).toBe('Hose split, "main" line\n(see photo)');
    expect(rows.find((r) => r[9].includes('calc'))?.[9]).toBe("'@cmd|calc");
    expect((res.body as string)).toContain('"Hose split, ""main"" line\n(see photo)"');
    expect(rows[1][7]).toBe('Fixed');
    expect(rows[1][11]).toBe('20');

    const causes = await lead.get(`/api/patterns/export/causes.csv?${RANGE}&installType=throttle_body`);
    expect(causes.text).toBe('cause_code,cause,walks\r\nport-left-open,Port left open,1\r\n');
    const none = await lead.get(`/api/patterns/export/repeats.csv?${RANGE}`);
    expect(none.text).toBe('install_type,cause_code,cause,jobs,walks,last_found_at\r\n');
    const missing = await lead.get(`/api/patterns/export/secrets.csv?${RANGE}`);
    expect(missing.status).toBe(404);
    expect(missing.body.error.message).toContain('secrets.csv');
  });

  it('exports every table of the demo history, agreeing with the report', async () => {
    const owner = await signedIn(t.app, demo.people.owner.email);
    const range = 'from=2025-12-01&to=2026-05-31';
    const report = (await owner.get(`/api/patterns?${range}`)).body;
    expect(report.totals.finished).toBeGreaterThan(150);
    expect(report.repeats.length).toBeGreaterThan(2);
    expect(report.totals.comebacks).toBeGreaterThanOrEqual(5);
    const csv = async (table: string) => parseCsv((await owner.get(`/api/patterns/export/${table}.csv?${range}`)).text);
    expect((await csv('walks')).length - 1).toBe(report.totals.finished);
    expect((await csv('causes')).slice(1).map((r) => [r[0], Number(r[2])])).toEqual(report.causes.map((c: { code: string; walks: number }) => [c.code, c.walks]));
    expect((await csv('repeats')).length - 1).toBe(report.repeats.length);
    const comebacks = await csv('comebacks');
    expect(comebacks.length - 1).toBe(report.totals.comebacks);
    expect(comebacks.slice(1).every((r) => Number(r[14]) <= report.windowDays)).toBe(true);
    expect((await csv('unresolved')).length - 1).toBe(report.unresolved.length);
    expect((await csv('times')).length - 1).toBe(report.times.length);
    const weeks = await csv('weeks');
    expect(weeks.slice(1).reduce((s, r) => s + Number(r[1]), 0)).toBe(report.totals.finished);
  });
});
