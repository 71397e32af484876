import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DESKTOP, PHONE, screenshot, servedAppInChromium, watchConsole } from '../support/browser';
import { signInThroughScreen } from '../support/sign-in-page';
import { createShopWithPeople, signedIn } from '../support/people';
import { installStockTrees } from '@/server/services/tree-stock';

const TREE = 'hiss-at-idle';
const FIRST = 'where-loudest';
const ANSWER = 'A cracked hose I can see';
const ANSWER_EVENT = 'answer.a-cracked-hose-i-can-see';
const CAUSE_TITLE = 'Cracked vacuum hose at the intake';
// Generous: the machine is shared and the first load of a screen compiles nothing but still parses the bundle.
const WAIT = { timeout: 30_000 };

describe('Tree authoring in Chromium', () => {
  const app = servedAppInChromium();

  const signIn = (page: Page, email: string) => signInThroughScreen(page, app.server.url, email, { timeout: WAIT.timeout });
  const text = (page: Page, id: string) => page.getByTestId(id).innerText();
  const waitForText = (page: Page, id: string, pattern: RegExp) =>
    page.waitForFunction(
      ([tid, src]) => new RegExp(src).test(document.querySelector(`[data-testid="${tid}"]`)?.textContent ?? ''),
      [id, pattern.source] as const,
      WAIT,
    );

  it('refuses a later save with a clear message, asks before leaving with unsaved changes, and reloads the saved draft (1280x800)', async () => {
    const shop = await createShopWithPeople(app.server.knex, 'Authoring conflict');
    await installStockTrees(app.server.knex, shop.shopId);
    const tree = await app.server.knex('trees').where({ shop_id: shop.shopId, slug: TREE }).first('id');
    const owner = await signedIn(app.server.app, shop.people.owner.email);
    expect((await owner.post(`/api/trees/${tree.id}/draft`)).status).toBe(201);

    const page = await app.browser.newPage({ viewport: DESKTOP });
    const errors = watchConsole(page);
    await signIn(page, shop.people.lead.email);
    await page.goto(`${app.server.url}/trees/${tree.id}/edit`);
    await page.getByTestId('step-form').waitFor(WAIT);

    // The owner saves the same draft after the lead opened it.
    const draft = (await owner.get(`/api/trees/${tree.id}/draft`)).body;
    const theirs = { ...draft.doc, title: 'Hiss at idle (owner edit)' };
    expect((await owner.put(`/api/trees/${tree.id}/draft`).send({ revision: draft.revision, doc: theirs })).status).toBe(200);

    // The lead's change is refused, not saved over the owner's, and the lead is told why.
    await page.getByTestId('step-title').fill('Where is the hiss loudest?');
    await page.getByTestId('save-conflict').waitFor(WAIT);
    expect(await text(page, 'save-conflict')).toContain(`${shop.people.owner.name} saved this tree after you opened it`);
    expect(await text(page, 'save-status')).toContain('someone else saved first');
    await screenshot(page, 'authoring-conflict-desktop');

    // Leaving now would lose the change: the app asks first, and staying keeps the editor.
    const asked: string[] = [];
    page.once('dialog', (d) => {
      asked.push(d.message());
      void d.dismiss();
    });
    await page.getByTestId('nav-jobs').click();
    await page.waitForFunction(() => document.querySelector('[data-testid="save-conflict"]') !== null, undefined, WAIT);
    expect(asked).toEqual([expect.stringContaining('were not saved')]);
    expect(new URL(page.url()).pathname).toBe(`/trees/${tree.id}/edit`);

    // Loading the saved draft shows the owner's version.
    await page.getByTestId('conflict-reload').click();
    await waitForText(page, 'tree-editor', /Hiss at idle \(owner edit\)/);
    await waitForText(page, 'save-status', /All changes saved/);
    expect((await owner.get(`/api/trees/${tree.id}/draft`)).body.doc.title).toBe('Hiss at idle (owner edit)');
    expect(errors.filter((e) => !/409/.test(e))).toEqual([]);
    await page.close();
  });

  it('refuses a malformed tree file naming the step, and creates a new tree straight into its draft (390x844)', async () => {
    const shop = await createShopWithPeople(app.server.knex, 'Authoring new');
    const page = await app.browser.newPage({ viewport: PHONE });
    const errors = watchConsole(page);
    await signIn(page, shop.people.lead.email);
    await page.goto(`${app.server.url}/trees`);
    await page.getByTestId('new-tree').click();
    await page.getByTestId('tree-create').waitFor(WAIT);

    // A file whose step has an unknown kind: nothing is imported and the step is named.
    const bad = { format: 'baywalk-tree/1', id: 'pasted-tree', title: 'Pasted', symptom: 'other', installTypes: ['other'], machine: { id: 'pasted-tree', initial: 'only', states: { only: { meta: { kind: 'question', title: 'Huh' } } } } };
    await page.getByTestId('import-text').fill(JSON.stringify(bad));
    await page.getByTestId('import-submit').click();
    await page.getByTestId('import-error').waitFor(WAIT);
    expect(await text(page, 'import-error')).toContain('Nothing was imported');
    expect(await text(page, 'import-findings')).toContain('Step "only"');
    await screenshot(page, 'authoring-import-refused-phone');

    // The form checks its fields with the shared schema before sending.
    await page.getByTestId('new-tree-submit').click();
    await page.getByTestId('new-tree-title-error').waitFor(WAIT);
    await page.getByTestId('new-tree-title').fill('Stumble on tip-in after a cam swap');
    await page.getByTestId('new-tree-symptom-rough_idle_or_misfire').click();
    await page.getByTestId('new-tree-install-camshaft').click();
    await page.getByTestId('new-tree-submit').click();
    await page.waitForURL(/\/trees\/\d+\/edit$/, WAIT);
    await waitForText(page, 'draft-findings', /Step "first-check": it has no answers/);
    expect(await text(page, 'tree-editor')).toContain('not published yet');
    expect(errors.filter((e) => !/400/.test(e))).toEqual([]);
    await page.close();
  });

  for (const [name, viewport] of [['phone', PHONE], ['desktop', DESKTOP]] as const) {
    it(`a lead edits a step, adds an answer to a new cause step, clears the finding, publishes; a tech walks the new version (${viewport.width}x${viewport.height})`, async () => {
      const shop = await createShopWithPeople(app.server.knex, `Authoring UI ${name}`);
      await installStockTrees(app.server.knex, shop.shopId);
      const tree = await app.server.knex('trees').where({ shop_id: shop.shopId, slug: TREE }).first('id');

      const page = await app.browser.newPage({ viewport });
      const errors = watchConsole(page);
      await signIn(page, shop.people.lead.email);
      await page.goto(`${app.server.url}/trees/${tree.id}`);
      await page.getByTestId('tree-authoring').waitFor(WAIT);
      expect(await text(page, 'tree-version')).toContain('Version 1');
      await page.getByTestId('start-draft').click();
      await page.waitForURL(/\/trees\/\d+\/edit$/, WAIT);
      await page.getByTestId('step-list').or(page.getByTestId('step-form')).first().waitFor(WAIT);
      expect(await text(page, 'save-status')).toContain('All changes saved');
      expect(await text(page, 'draft-checks-title')).toMatch(/ready to publish/);

      // Open the first step (a wide screen opens it already) and edit its text; the preview follows.
      if (viewport === PHONE) await page.getByTestId(`edit-step-${FIRST}`).click();
      await page.getByTestId('step-form').waitFor(WAIT);
      const body = page.getByTestId('step-body');
      await body.fill(`${await body.inputValue()}\n\n**Listen with the engine warm** before anything else.`);
      await waitForText(page, 'step-preview', /Listen with the engine warm before anything else/);
      await screenshot(page, `authoring-step-form-${name}`);

      // A new answer that leads to a new cause step: the checks name the unfinished step.
      await page.getByTestId('new-answer-label').fill(ANSWER);
      await page.getByTestId('new-answer-add').click();
      await page.getByTestId(`answer-${ANSWER_EVENT}-target`).click();
      await page.getByTestId(`answer-${ANSWER_EVENT}-target-new-cause`).click();
      await waitForText(page, 'draft-findings', /Step "new-cause"/);
      expect(await text(page, 'draft-checks-title')).toMatch(/problems? to fix before publishing/);
      // Beside the step: in the list on a wide screen, and at the top of its form once opened.
      if (viewport === DESKTOP) expect(await text(page, 'step-marks-new-cause')).toMatch(/✖ \d+ problems?/);
      await screenshot(page, `authoring-finding-${name}`);

      // Complete the new step: the finding disappears.
      await page.getByTestId(`answer-${ANSWER_EVENT}-target-open`).click();
      await waitForText(page, 'step-form', /Cause step/);
      await waitForText(page, 'step-findings', /Problem: Step "new-cause"/);
      await page.getByTestId('step-title').fill(CAUSE_TITLE);
      await page.getByTestId('cause-code').fill('cracked-vacuum-hose');
      await page.getByTestId('cause-area').fill('Vacuum hose at the intake');
      await page.getByTestId('cause-fix').fill('Replace the hose and both clamps, then re-test idle vacuum.');
      await waitForText(page, 'draft-checks-title', /ready to publish/);
      expect(await page.getByTestId('draft-findings').count()).toBe(0);
      expect(await page.getByTestId('step-findings').count()).toBe(0);

      if (viewport === DESKTOP) {
        // Deleting a step warns with the steps that point at it.
        await page.getByTestId('edit-step-new-cause').click();
        await page.getByTestId('step-delete').click();
        await page.getByTestId('delete-referrer-where-loudest').waitFor(WAIT);
        expect(await text(page, 'delete-confirm')).toContain(`“${ANSWER}”`);
        await page.getByTestId('delete-confirm-no').click();
        expect(await page.getByTestId('edit-step-new-cause').count()).toBe(1);

        // The graph: every step drawn, kinds by shape and word; choosing a step opens it in the form.
        await page.getByTestId('editor-view-graph').click();
        await page.getByTestId('tree-graph').waitFor(WAIT);
        expect(await page.locator('[data-testid^="graph-node-"]').count()).toBeGreaterThan(5);
        expect(await page.getByTestId('tree-graph').innerText()).toContain('CAUSE');
        await screenshot(page, `authoring-graph-${name}`);
        await page.getByTestId(`graph-node-${FIRST}`).click();
        await waitForText(page, 'step-form', /Ask step/);
      }

      // Autosave catches up, then publish with a note.
      await waitForText(page, 'save-status', /All changes saved/);
      await page.getByTestId('publish-note').fill('Added a cracked-hose answer and cause');
      await screenshot(page, `authoring-publish-${name}`);
      await page.getByTestId('publish-submit').click();
      await page.waitForURL((url) => url.pathname === `/trees/${tree.id}`, WAIT);
      await waitForText(page, 'tree-version', /Version 2/);
      expect(errors).toEqual([]);
      await page.close();

      // A technician starts a walk: it runs on the new version and reaches the new cause.
      const api = await signedIn(app.server.app, shop.people.tech.email);
      const job = await api.post('/api/jobs').send({ roNumber: `AU-${name}`, customerName: 'Tamsin Reed', install: [{ type: 'throttle_body', text: '' }] });
      expect(job.status).toBe(201);
      const tech = await app.browser.newPage({ viewport });
      const techErrors = watchConsole(tech);
      await signIn(tech, shop.people.tech.email);
      // A technician reads the tree and its history but gets no writing tools.
      await tech.goto(`${app.server.url}/trees/${tree.id}`);
      await tech.getByTestId('tree-history-link').waitFor(WAIT);
      expect(await tech.getByTestId('start-draft').count()).toBe(0);
      expect(await tech.getByTestId('retire-tree').count()).toBe(0);
      await tech.goto(`${app.server.url}/jobs/${job.body.job.id}`);
      const pick = tech.getByTestId(`start-walk-${TREE}`).first();
      await pick.waitFor(WAIT);
      expect(await pick.innerText()).toContain('version 2');
      await pick.click();
      await tech.waitForURL(/\/walks\/\d+$/, WAIT);
      await tech.getByTestId(`answer-${ANSWER_EVENT}`).click();
      await tech.getByTestId('step-cause').waitFor(WAIT);
      expect(await tech.getByTestId('step-title').innerText()).toContain(CAUSE_TITLE);
      await screenshot(tech, `authoring-walk-new-version-${name}`);
      const walkId = Number(new URL(tech.url()).pathname.split('/').pop());
      const walk = await app.server.knex('walks as w').join('tree_versions as v', 'v.id', 'w.tree_version_id').where('w.id', walkId).first('v.version');
      expect(walk.version).toBe(2);
      expect(techErrors).toEqual([]);
      await tech.close();

      // Back with the lead: the history shows both versions and what changed; the tree page counts the finished walk.
      expect((await api.post(`/api/walks/${walkId}/finish`).send({ outcome: 'fixed' })).status).toBe(200);
      const lead = await app.browser.newPage({ viewport });
      await signIn(lead, shop.people.lead.email);
      await lead.goto(`${app.server.url}/trees/${tree.id}/history`);
      await lead.getByTestId('diff-view').waitFor(WAIT);
      expect(await text(lead, 'history-version-2')).toContain('Added a cracked-hose answer and cause');
      expect(await text(lead, 'history-version-2')).toContain(`by ${shop.people.lead.name}`);
      expect(await text(lead, 'diff-step-new-cause')).toContain('Added');
      expect(await text(lead, `diff-step-${FIRST}`)).toContain('+ **Listen with the engine warm** before anything else.');
      expect(await text(lead, `diff-step-${FIRST}`)).toContain(`+ ${ANSWER} → new-cause`);
      await screenshot(lead, `authoring-history-${name}`);
      await lead.goto(`${app.server.url}/trees/${tree.id}`);
      await lead.getByTestId('stats-cause-new-cause').waitFor(WAIT);
      expect(await text(lead, 'stats-cause-new-cause')).toContain('1 walk');
      expect(await text(lead, `stats-step-${FIRST}`)).toContain(`${ANSWER}: 1 (100 %)`);
      await lead.getByTestId('tree-stats').scrollIntoViewIfNeeded();
      await screenshot(lead, `authoring-stats-${name}`);
      await lead.close();
    });
  }
});
