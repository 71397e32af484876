import crypto from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { installStockTrees } from '@/server/services/tree-stock';
import { draftSchema, importedSchema, versionDiffSchema } from '@/shared/schemas/tree-authoring';
import { soundTree } from '@/trees/fixtures/sound-tree';
import { treeDocSchema } from '@/trees/tree-format';
import { createTestApp } from '../support/test-app';
import { createShopWithPeople, signedIn, type TestShop } from '../support/people';

type Agent = Awaited<ReturnType<typeof signedIn>>;
const uuid = () => crypto.randomUUID();
const STOCK = 'lean-after-intake-manifold';

describe('tree authoring API', () => {
  const t = createTestApp();
  let shop: TestShop;
  let lead: Agent;
  let owner: Agent;
  let tech: Agent;
  let support: Agent;
  let stockId: number;

  beforeAll(async () => {
    shop = await createShopWithPeople(t.knex, 'Authoring');
    await installStockTrees(t.knex, shop.shopId);
    stockId = (await t.knex('trees').where({ shop_id: shop.shopId, slug: STOCK }).first('id')).id;
    [lead, owner, tech, support] = await Promise.all(['lead', 'owner', 'tech', 'support'].map((r) => signedIn(t.app, shop.people[r as 'lead'].email)));
  });
  afterAll(() => t.close());

  const newTree = async (a: Agent, title = `Idle surge ${uuid().slice(0, 6)}`) => {
    const res = await a.post('/api/trees').send({ title, symptom: 'high_or_hunting_idle', installTypes: ['throttle_body'], summary: 'Written in a test.' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return draftSchema.parse(res.body);
  };

  it('lets only leads and owners create, edit, publish and retire', async () => {
    for (const a of [tech, support]) {
      expect((await a.post('/api/trees').send({ title: 'Not mine to write', symptom: 'other', installTypes: ['other'] })).status).toBe(403);
      expect((await a.post(`/api/trees/${stockId}/draft`)).status).toBe(403);
      expect((await a.put(`/api/trees/${stockId}/draft`).send({ revision: 1, doc: {} })).status).toBe(403);
      expect((await a.post(`/api/trees/${stockId}/publish`).send({ revision: 1, note: 'Sneaky' })).status).toBe(403);
      expect((await a.post(`/api/trees/${stockId}/retire`)).status).toBe(403);
      expect((await a.post('/api/trees/import').send({ text: '{}' })).status).toBe(403);
    }
    // Reading history, statistics and exports is open to every staff member.
    expect((await tech.get(`/api/trees/${stockId}/history`)).status).toBe(200);
    expect((await support.get(`/api/trees/${stockId}/stats`)).status).toBe(200);
    const owned = await newTree(owner);
    expect(owned.author?.name).toBe(shop.people.owner.name);
    const leads = await newTree(lead);
    expect(leads.version).toBe(1);
    // Nothing was changed by the refused calls.
    expect((await t.knex('tree_versions').where({ tree_id: stockId })).map((v: { state: string }) => v.state)).toEqual(['published']);
  });

  it('creates a tree as a draft whose checks name what is missing; the id comes from the title', async () => {
    const d = await newTree(lead, 'Surging idle after a throttle body swap');
    expect(d.slug).toBe('surging-idle-after-a-throttle-body-swap');
    expect(d.publishedVersion).toBeNull();
    expect(d.findings).toEqual([expect.objectContaining({ severity: 'error', stepId: 'first-check', code: 'dead_end' })]);
    // The same title again gets a free id rather than a clash.
    expect((await newTree(lead, 'Surging idle after a throttle body swap')).slug).toBe('surging-idle-after-a-throttle-body-swap-2');
    const taken = await lead.post('/api/trees').send({ title: 'Clash', symptom: 'other', installTypes: ['other'], slug: STOCK });
    expect(taken.status).toBe(409);
    expect(taken.body.error.details.fields.slug).toBe('This id is taken.');
    const bad = await lead.post('/api/trees').send({ title: '', symptom: 'sparkly', installTypes: [] });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.details.fields).sort()).toEqual(['installTypes', 'symptom', 'title']);
  });

  it('refuses to publish a draft with errors, naming the steps at fault, and keeps it unpublished', async () => {
    const d = await newTree(lead);
    const res = await lead.post(`/api/trees/${d.treeId}/publish`).send({ revision: d.revision, note: 'First go' });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('draft_has_errors');
    expect(res.body.error.message).toMatch(/step "first-check"/);
    expect(res.body.error.details.steps).toEqual(['first-check']);

    // A fuller draft with two broken steps: both are named.
    const doc = structuredClone(d.doc) as ReturnType<typeof soundTree>;
    const states = doc.machine.states as Record<string, unknown>;
    states['first-check'] = { meta: { kind: 'ask', title: 'Does it surge?', body: '', cautions: [], photoPrompts: [] }, on: { 'answer.yes': { target: 'no-such-step', description: 'Yes' }, 'answer.no': { target: 'orphan-end', description: 'No' } } };
    states['orphan-end'] = { type: 'final', meta: { kind: 'refer', title: 'Hand over', refer: { to: 'Lead', reason: 'Nothing found.' } } };
    states['lonely'] = { type: 'final', meta: { kind: 'refer', title: 'Nobody gets here', refer: { to: 'Lead', reason: 'Unlinked.' } } };
    const saved = await lead.put(`/api/trees/${d.treeId}/draft`).send({ revision: d.revision, doc });
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    const again = await lead.post(`/api/trees/${d.treeId}/publish`).send({ revision: saved.body.revision, note: 'Second go' });
    expect(again.status).toBe(422);
    expect(again.body.error.message).toMatch(/2 problems are fixed, in steps "first-check" and "lonely"\./);
    expect(again.body.error.details.steps.sort()).toEqual(['first-check', 'lonely']);
    expect(again.body.error.details.findings.map((f: { code: string }) => f.code).sort()).toEqual(['unknown_target', 'unreachable']);
    const row = await t.knex('trees').where({ id: d.treeId }).first();
    expect(row.published_version_id).toBeNull();
  });

  it('keeps one draft per tree and refuses a later save made against a stale revision (409)', async () => {
    const started = await lead.post(`/api/trees/${stockId}/draft`);
    expect(started.status).toBe(201);
    const draft = draftSchema.parse(started.body);
    const published = await lead.get(`/api/trees/${stockId}`);
    expect(draft.doc).toEqual(published.body.version.doc);
    expect(draft.publishedVersion).toBe(1);

    const second = await owner.post(`/api/trees/${stockId}/draft`);
    expect(second.status).toBe(409);
    expect(second.body.error.message).toMatch(/already has a draft/);

    // Lead and owner both opened the draft at the same revision.
    const ownerCopy = draftSchema.parse((await owner.get(`/api/trees/${stockId}/draft`)).body);
    expect(ownerCopy.revision).toBe(draft.revision);
    const leadDoc = structuredClone(draft.doc) as { title: string };
    leadDoc.title = 'Lean codes after an intake change (lead edit)';
    const first = await lead.put(`/api/trees/${stockId}/draft`).send({ revision: draft.revision, doc: leadDoc });
    expect(first.status).toBe(200);
    expect(first.body.revision).toBe(draft.revision + 1);

    const ownerDoc = structuredClone(ownerCopy.doc) as { title: string };
    ownerDoc.title = 'Owner overwrite attempt';
    const later = await owner.put(`/api/trees/${stockId}/draft`).send({ revision: ownerCopy.revision, doc: ownerDoc });
    expect(later.status).toBe(409);
    expect(later.body.error.code).toBe('conflict');
    expect(later.body.error.message).toBe(
      `${shop.people.lead.name} saved this tree after you opened it, so your changes were not saved over theirs. Reload the draft to see their changes, then make yours again.`,
    );
    expect(later.body.error.details.revision).toBe(first.body.revision);
    const stored = draftSchema.parse((await owner.get(`/api/trees/${stockId}/draft`)).body);
    expect((stored.doc as { title: string }).title).toBe(leadDoc.title);
    expect(stored.updatedBy?.name).toBe(shop.people.lead.name);

    // Saving with the fresh revision works; the tree id cannot be changed.
    expect((await owner.put(`/api/trees/${stockId}/draft`).send({ revision: stored.revision, doc: stored.doc })).status).toBe(200);
    const renamed = await owner.put(`/api/trees/${stockId}/draft`).send({ revision: stored.revision + 1, doc: { ...stored.doc, id: 'something-else' } });
    expect(renamed.status).toBe(400);
    expect(renamed.body.error.details.fields['doc.id']).toBe(`Keep "${STOCK}".`);

    // Discarding leaves the published version as it was.
    expect((await owner.delete(`/api/trees/${stockId}/draft`)).status).toBe(204);
    expect((await owner.get(`/api/trees/${stockId}/draft`)).status).toBe(404);
    expect((await owner.get(`/api/trees/${stockId}`)).body.version.version).toBe(1);
  });

  it('asks for warnings to be accepted before publishing, then publishes with who and the note', async () => {
    const d = draftSchema.parse((await lead.post(`/api/trees/${stockId}/draft`)).body);
    const doc = structuredClone(d.doc) as { machine: { id: string } };
    doc.machine.id = 'a-different-machine-id'; // a warning, not an error
    const saved = await lead.put(`/api/trees/${stockId}/draft`).send({ revision: d.revision, doc, note: 'Renamed the machine' });
    expect(saved.body.findings).toEqual([expect.objectContaining({ severity: 'warning', code: 'machine_id_mismatch' })]);
    const refused = await lead.post(`/api/trees/${stockId}/publish`).send({ revision: saved.body.revision, note: 'Machine id' });
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('warnings_not_accepted');
    expect(refused.body.error.details.findings).toHaveLength(1);
    const noNote = await lead.post(`/api/trees/${stockId}/publish`).send({ revision: saved.body.revision, note: '' });
    expect(noNote.status).toBe(400);
    expect(noNote.body.error.details.fields.note).toMatch(/what changed/);
    const ok = await lead.post(`/api/trees/${stockId}/publish`).send({ revision: saved.body.revision, note: 'Machine id changed on purpose', acceptWarnings: true });
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    expect(ok.body.version).toBe(d.version);

    const history = await tech.get(`/api/trees/${stockId}/history`);
    const top = history.body.versions[0];
    expect(top).toMatchObject({ version: d.version, state: 'published', note: 'Machine id changed on purpose', authorName: shop.people.lead.name, publishedBy: shop.people.lead.name });
    expect(history.body.versions[1]).toMatchObject({ version: 1, state: 'retired', authorName: 'Baywalk stock library' });
  });
});

describe('publishing, walks and retiring', () => {
  const t = createTestApp();
  let shop: TestShop;
  let lead: Agent;
  let tech: Agent;
  let treeId: number;
  let jobId: number;
  beforeAll(async () => {
    shop = await createShopWithPeople(t.knex, 'Pinned');
    await installStockTrees(t.knex, shop.shopId);
    treeId = (await t.knex('trees').where({ shop_id: shop.shopId, slug: STOCK }).first('id')).id;
    [lead, tech] = await Promise.all([signedIn(t.app, shop.people.lead.email), signedIn(t.app, shop.people.tech.email)]);
    const job = await tech.post('/api/jobs').send({ roNumber: `A-${uuid().slice(0, 8)}`, customerName: 'Ida Marsh', install: [{ type: 'intake_manifold', text: '' }] });
    jobId = job.body.job.id;
  });
  afterAll(() => t.close());

  it('keeps a walk started before a publish on its own version; new walks take the new one', async () => {
    const before = await tech.post('/api/walks').send({ jobId, treeId });
    expect(before.status).toBe(201);
    const walkId = before.body.walk.id as number;
    const v1 = before.body.walk.tree.versionId as number;

    const d = draftSchema.parse((await lead.post(`/api/trees/${treeId}/draft`)).body);
    const doc = structuredClone(d.doc) as { machine: { initial: string; states: Record<string, { meta: { title: string } }> } };
    doc.machine.states[doc.machine.initial].meta.title = 'Read the total fuel trim at idle, warm engine';
    const saved = await lead.put(`/api/trees/${treeId}/draft`).send({ revision: d.revision, doc });
    const pub = await lead.post(`/api/trees/${treeId}/publish`).send({ revision: saved.body.revision, note: 'Clearer first step' });
    expect(pub.status).toBe(200);

    const old = await tech.get(`/api/walks/${walkId}`);
    expect(old.body.walk.tree).toMatchObject({ versionId: v1, version: 1 });
    expect(old.body.doc.machine.states[old.body.doc.machine.initial].meta.title).not.toBe('Read the total fuel trim at idle, warm engine');
    // The old walk still takes answers against its own version.
    const step = await tech.post(`/api/walks/${walkId}/steps`).send({ stepId: uuid(), event: { type: 'reading', value: 18, unit: '%' } });
    expect(step.status, JSON.stringify(step.body)).toBe(200);

    const after = await tech.post('/api/walks').send({ jobId, treeId });
    expect(after.body.walk.tree).toMatchObject({ versionId: pub.body.versionId, version: 2 });
    const fresh = await tech.get(`/api/walks/${after.body.walk.id}`);
    expect(fresh.body.doc.machine.states[fresh.body.doc.machine.initial].meta.title).toBe('Read the total fuel trim at idle, warm engine');
  });

  it('retires a tree: gone from the picker, refused for new walks, history and old walks kept; it can come back', async () => {
    const walk = await tech.post('/api/walks').send({ jobId, treeId });
    const retire = await lead.post(`/api/trees/${treeId}/retire`);
    expect(retire.status).toBe(200);
    expect(retire.body.status).toBe('retired');
    expect((await tech.get('/api/trees')).body.trees.map((x: { id: number }) => x.id)).not.toContain(treeId);
    const refused = await tech.post('/api/walks').send({ jobId, treeId });
    expect(refused.status).toBe(409);
    expect((await tech.get(`/api/trees/${treeId}`)).status).toBe(200);
    expect((await tech.get(`/api/trees/${treeId}/history`)).body.versions.length).toBeGreaterThanOrEqual(2);
    expect((await tech.get(`/api/walks/${walk.body.walk.id}`)).status).toBe(200);
    expect((await lead.get('/api/retired-trees')).body.trees.map((x: { id: number }) => x.id)).toContain(treeId);

    expect((await lead.post(`/api/trees/${treeId}/restore`)).body.status).toBe('active');
    expect((await tech.get('/api/trees')).body.trees.map((x: { id: number }) => x.id)).toContain(treeId);
  });

  it('shows the step-by-step difference between two versions, with a text difference for bodies', async () => {
    const history = (await tech.get(`/api/trees/${treeId}/history`)).body.versions as Array<{ id: number; version: number }>;
    const v1 = history.find((v) => v.version === 1)!;
    const v2 = history.find((v) => v.version === 2)!;
    const res = await tech.get(`/api/trees/${treeId}/diff?from=${v1.id}&to=${v2.id}`);
    expect(res.status).toBe(200);
    const diff = versionDiffSchema.parse(res.body);
    expect(diff.steps).toHaveLength(1);
    expect(diff.steps[0]).toMatchObject({ change: 'changed', title: 'Read the total fuel trim at idle, warm engine' });
    expect(diff.steps[0].fields.map((f) => f.field)).toEqual(['title']);
    expect((await tech.get(`/api/trees/${treeId}/diff?from=${v1.id}`)).status).toBe(400);
    expect((await tech.get(`/api/trees/${treeId}/diff?from=${v1.id}&to=987654321`)).status).toBe(404);
  });
});

describe('import and export', () => {
  const t = createTestApp();
  let shop: TestShop;
  let lead: Agent;
  beforeAll(async () => {
    shop = await createShopWithPeople(t.knex, 'Files');
    await installStockTrees(t.knex, shop.shopId);
    lead = await signedIn(t.app, shop.people.lead.email);
  });
  afterAll(() => t.close());

  const fixture = (id: string) => {
    const doc = soundTree();
    doc.id = id;
    doc.machine.id = id;
    return doc;
  };

  it('refuses a file that is not JSON, with a message saying so, and saves nothing', async () => {
    const before = await t.knex('trees').where({ shop_id: shop.shopId }).count({ n: '*' }).first();
    const res = await lead.post('/api/trees/import').send({ text: '{"format": "baywalk-tree/1", "id": ', fileName: 'cut-off.json' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/^Nothing was imported: the file is not valid JSON/);
    expect(await t.knex('trees').where({ shop_id: shop.shopId }).count({ n: '*' }).first()).toEqual(before);
  });

  it('refuses a malformed tree with messages that name the step at fault', async () => {
    const doc = fixture('malformed-import') as unknown as { machine: { states: Record<string, any> } };
    doc.machine.states['look-hoses'].meta.kind = 'question';
    delete doc.machine.states['weak-pump'].meta.cause.fix;
    const res = await lead.post('/api/trees/import').send({ text: JSON.stringify(doc) });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('import_invalid');
    expect(res.body.error.message).toMatch(/^Nothing was imported: the file has 2 problems, in "look-hoses" and "weak-pump"\./);
    const messages = res.body.error.details.findings.map((f: { message: string }) => f.message);
    expect(messages).toContainEqual(expect.stringMatching(/^Step "look-hoses", /));
    expect(messages).toContainEqual(expect.stringMatching(/^Step "weak-pump", meta\.cause\.fix/));
    expect(await t.knex('trees').where({ shop_id: shop.shopId, slug: 'malformed-import' }).first()).toBeUndefined();

    const broken = fixture('broken-links') as unknown as { machine: { states: Record<string, any> } };
    broken.machine.states['replace-hose'].on.done.target = 'nowhere';
    const res2 = await lead.post('/api/trees/import').send({ text: JSON.stringify(broken) });
    expect(res2.status).toBe(400);
    expect(res2.body.error.details.findings).toContainEqual(expect.objectContaining({ stepId: 'replace-hose', code: 'unknown_target' }));
    expect((await lead.post('/api/trees/import').send({})).body.error.details.fields.text).toBe('Choose a tree file to import.');
  });

  it('imports a good file as a draft of a new tree, and a second file as a new draft of the same tree', async () => {
    const res = await lead.post('/api/trees/import').send({ text: JSON.stringify(fixture('imported-lean')), fileName: 'imported-lean.json' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const imported = importedSchema.parse(res.body);
    expect(imported).toMatchObject({ created: true, version: 1, warnings: [] });
    const draft = draftSchema.parse((await lead.get(`/api/trees/${imported.treeId}/draft`)).body);
    // Stored as the format reads it: left-out optional fields are filled with their defaults.
    expect(draft.doc).toEqual(treeDocSchema.parse(fixture('imported-lean')));
    expect(draft.findings).toEqual([]);

    const again = await lead.post('/api/trees/import').send({ text: JSON.stringify(fixture('imported-lean')) });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/already has a draft/);

    const pub = await lead.post(`/api/trees/${imported.treeId}/publish`).send({ revision: draft.revision, note: 'Imported' });
    expect(pub.status).toBe(200);
    const second = await lead.post('/api/trees/import').send({ text: JSON.stringify(fixture('imported-lean')) });
    expect(second.status).toBe(201);
    expect(second.body).toMatchObject({ treeId: imported.treeId, created: false, version: 2 });
  });

  it('exports the published version as a Baywalk file that imports back unchanged', async () => {
    const stock = await t.knex('trees').where({ shop_id: shop.shopId, slug: STOCK }).first('id');
    const res = await lead.get(`/api/trees/${stock.id}/export`).buffer(true).parse((r, cb) => {
      let text = '';
      r.on('data', (c: Buffer) => (text += c.toString()));
      r.on('end', () => cb(null, text));
    });
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toBe(`attachment; filename="${STOCK}-v1.json"`);
    const doc = JSON.parse(res.body as string);
    expect(doc.format).toBe('baywalk-tree/1');
    expect(doc).toEqual((await lead.get(`/api/trees/${stock.id}`)).body.version.doc);
    expect((await lead.get(`/api/trees/${stock.id}/export?version=9`)).status).toBe(404);

    // Into another shop it arrives as a new draft that passes the checks.
    const other = await createShopWithPeople(t.knex, 'Files other');
    const theirs = await signedIn(t.app, other.people.owner.email);
    const imported = await theirs.post('/api/trees/import').send({ text: res.body });
    expect(imported.status).toBe(201);
    expect((await theirs.get(`/api/trees/${imported.body.treeId}/draft`)).body.doc).toEqual(doc);
  });
});
