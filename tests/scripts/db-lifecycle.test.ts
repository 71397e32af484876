/// <reference types="node" />
import { afterAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';

const root = path.resolve(__dirname, '../..');
const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'baywalk-db-'));

async function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const s = net.createServer().listen(0, '127.0.0.1', () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
}

function run(script: string, port: number) {
  const res = spawnSync('bash', [path.join(root, 'scripts', script)], {
    env: { ...process.env, BAYWALK_DATA_DIR: dataDir, BAYWALK_DB_PORT: String(port) },
    encoding: 'utf8',
    timeout: 60_000,
  });
  return { code: res.status, out: `${res.stdout}${res.stderr}` };
}

describe('private MariaDB scripts', () => {
  let port = 0;
  afterAll(() => {
    if (port) run('db-down.sh', port);
    fs.rmSync(dataDir, { recursive: true, force: true });
  });

  it('a port taken by another program gives one clear line and leaves no half-made data directory', async () => {
    const blocker = net.createServer().listen(0, '127.0.0.1');
    await new Promise((r) => blocker.once('listening', r));
    const taken = (blocker.address() as net.AddressInfo).port;
    const res = run('db-up.sh', taken);
    blocker.close();
    expect(res.code).not.toBe(0);
    expect(res.out).toMatch(new RegExp(`port ${taken} on 127\\.0\\.0\\.1 is taken by another program; set BAYWALK_DB_PORT`));
    // The data directory is either complete or absent, never half-written.
    const entries = fs.existsSync(dataDir) ? fs.readdirSync(dataDir) : [];
    expect(entries.filter((e) => e.startsWith('mariadb.init'))).toEqual([]);
    if (entries.includes('mariadb')) expect(fs.existsSync(path.join(dataDir, 'mariadb', 'mysql'))).toBe(true);
  });

  it('starts, is idempotent, and comes back after kill -9', async () => {
    port = await freePort();
    const first = run('db-up.sh', port);
    expect(first.code, first.out).toBe(0);
    expect(first.out).toMatch(/MariaDB ready on 127\.0\.0\.1/);

    const second = run('db-up.sh', port);
    expect(second.code, second.out).toBe(0);
    expect(second.out).not.toMatch(/starting MariaDB/);

    const pid = Number(fs.readFileSync(path.join(dataDir, 'run', 'mariadb.pid'), 'utf8'));
    process.kill(pid, 'SIGKILL');
    await new Promise((r) => setTimeout(r, 300));
    const third = run('db-up.sh', port);
    expect(third.code, third.out).toBe(0);
    expect(third.out).toMatch(/starting MariaDB/);

    const down = run('db-down.sh', port);
    expect(down.out).toMatch(/MariaDB stopped/);
    expect(run('db-down.sh', port).out).toMatch(/not running/);
    port = 0;
  });
});
