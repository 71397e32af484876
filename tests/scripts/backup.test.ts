/// <reference types="node" />
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import type { Knex } from 'knex';
import { loadConfig } from '@/server/config';
import { createTestApp } from '../support/test-app';
import { signedIn } from '../support/people';
import { freshDatabase, knexFor, LEAN_PATH, ROOT, shopWithTrees, testDbName } from './crash-support';

const sha = (file: string) => crypto.createHash('sha256').update(fs.readFileSync(file)).digest('hex');
const filesUnder = (dir: string) =>
  fs.existsSync(dir) ? fs.readdirSync(dir, { recursive: true, withFileTypes: true }).filter((d) => d.isFile()).map((d) => path.relative(dir, path.join(d.parentPath, d.name))).sort() : [];

/** Every table of a database with its row count. */
async function rowCounts(knex: Knex, db: string): Promise<Record<string, number>> {
  const tables: Array<{ name: string }> = (await knex.raw('SELECT table_name AS name FROM information_schema.tables WHERE table_schema = ? ORDER BY table_name', [db]))[0];
  const out: Record<string, number> = {};
  for (const { name } of tables) out[name] = Number((await knex.raw(`SELECT COUNT(*) AS n FROM \`${db}\`.\`${name}\``))[0][0].n);
  return out;
}

/**
 * npm run backup and npm run restore: a database with shops, jobs, walks,
 * steps, sessions and a photo is backed up, restored into a FRESH database
 * (another name) and photo folder, and every table has the same row count;
 * the photo files are identical, and the app works on the restored copy.
 */
describe('backup and restore', () => {
  const source = testDbName('backup_src');
  const target = testDbName('backup_dst');
  const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'baywalk-backup-test-'));
  const dirs = { photos: path.join(tmp, 'photos'), restoredPhotos: path.join(tmp, 'restored-photos'), backups: path.join(tmp, 'backups') };
  let src: ReturnType<typeof freshDatabase>;
  let knex: Knex;
  const script = (name: string, args: string[], env: Record<string, string>) =>
    spawnSync('bash', [path.join(ROOT, 'scripts', name), ...args], { env: { ...process.env, ...env }, encoding: 'utf8', timeout: 90_000 });

  beforeAll(() => {
    src = freshDatabase(source);
    freshDatabase(target).drop();
    knex = knexFor(source);
  }, 120_000);
  afterAll(async () => {
    await knex?.destroy();
    src?.drop();
    spawnSync('mariadb', ['--no-defaults', '-S', src?.sock ?? '', '-uroot', '-e', `DROP DATABASE IF EXISTS \`${target}\``]);
    fs.rmSync(tmp, { recursive: true, force: true });
  }, 60_000);

  it('restores into a fresh database with the same rows in every table and the same photos', async () => {
    // Real data through the real app: a shop with the stock trees, a job, a walk with steps and a photo.
    const { shop, treeId } = await shopWithTrees(knex, 'Backup');
    const app = createTestApp({ db: { ...loadConfig().db, database: source }, photosDir: dirs.photos });
    let walkId: number;
    try {
      const tech = await signedIn(app.app, shop.people.tech.email);
      const job = await tech.post('/api/jobs').send({ roNumber: 'B-1', customerName: 'Imogen Vale', install: [{ type: 'intake_manifold', text: 'Ported runners' }] });
      walkId = (await tech.post('/api/walks').send({ jobId: job.body.job.id, treeId })).body.walk.id;
      for (const event of LEAN_PATH.slice(0, 3)) expect((await tech.post(`/api/walks/${walkId}/steps`).send({ stepId: crypto.randomUUID(), event })).status).toBe(200);
      const png = await sharp({ create: { width: 40, height: 30, channels: 3, background: '#b45309' } }).png().toBuffer();
      expect((await tech.post(`/api/walks/${walkId}/photos`).field('step', 'visual-hoses').attach('photo', png, 'hose.png')).status).toBe(201);
    } finally {
      await app.close();
    }
    const before = await rowCounts(knex, source);
    expect(before.walk_steps).toBe(3);
    expect(before.photos).toBe(1);

    const env = { BAYWALK_DB_NAME: source, BAYWALK_PHOTOS_DIR: dirs.photos, BAYWALK_BACKUP_DIR: dirs.backups };
    const backup = script('backup.sh', [], env);
    expect(backup.status, `${backup.stdout}${backup.stderr}`).toBe(0);
    const [archive] = fs.readdirSync(dirs.backups);
    expect(archive).toMatch(new RegExp(`^baywalk-${source}-\\d{8}T\\d{6}Z\\.tar\\.gz$`));
    expect(backup.stdout).toContain(path.join(dirs.backups, archive));

    // Refuses to overwrite a database that has tables, unless told to.
    const refused = script('restore.sh', [path.join(dirs.backups, archive), '--into', source], { BAYWALK_PHOTOS_DIR: dirs.restoredPhotos });
    expect(refused.status).not.toBe(0);
    expect(refused.stderr).toMatch(/already has \d+ tables; restore into another with --into NAME, or pass --replace/);

    const restore = script('restore.sh', [path.join(dirs.backups, archive), '--into', target], { BAYWALK_PHOTOS_DIR: dirs.restoredPhotos });
    expect(restore.status, `${restore.stdout}${restore.stderr}`).toBe(0);
    expect(await rowCounts(knex, target)).toEqual(before);
    expect(filesUnder(dirs.restoredPhotos)).toEqual(filesUnder(dirs.photos));
    expect(filesUnder(dirs.photos)).toHaveLength(2); // the photo and its thumbnail
    for (const f of filesUnder(dirs.photos)) expect(sha(path.join(dirs.restoredPhotos, f))).toBe(sha(path.join(dirs.photos, f)));

    // The app runs on the restored copy: the same walk, position and photo.
    const restored = createTestApp({ db: { ...loadConfig().db, database: target }, photosDir: dirs.restoredPhotos });
    try {
      const tech = await signedIn(restored.app, shop.people.tech.email);
      const walk = await tech.get(`/api/walks/${walkId}`);
      expect(walk.status).toBe(200);
      expect(walk.body.position).toMatchObject({ stepId: 'visual-hoses', stepsTaken: 3 });
      expect((await tech.get(walk.body.photos[0].url)).status).toBe(200);
    } finally {
      await restored.close();
    }
  });
});
