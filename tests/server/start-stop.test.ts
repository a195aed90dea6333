/**
 * `npm start`'s server process, for real: it creates and starts its own PostgreSQL, serves, stops
 * that PostgreSQL on SIGINT (what Ctrl+C sends), and keeps the data for the next start.
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { projectRoot } from '../../server/config.ts';
import { findServerBin, freePort } from '../../server/db/postgres.ts';
import { isRoot } from '../../server/system/debian.ts';

const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'blockwright-start-'));
// mkdtemp makes it private to us; as root, the postgres user must be able to reach the cluster inside.
fs.chmodSync(dataDir, 0o755);
afterAll(() => fs.rmSync(dataDir, { recursive: true, force: true }));

interface Running {
  child: ChildProcess;
  url: string;
  output: () => string;
}

async function startServer(port: number, pgPort: number): Promise<Running> {
  const child = spawn(path.join(projectRoot, 'node_modules/.bin/tsx'), ['server/main.ts'], {
    cwd: projectRoot,
    env: {
      ...process.env,
      NODE_ENV: 'development',
      PORT: String(port),
      BLOCKWRIGHT_PG_PORT: String(pgPort),
      BLOCKWRIGHT_DATA_DIR: dataDir,
      DATABASE_URL: '',
      LOG_LEVEL: 'info',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout!.on('data', (d: Buffer) => (output += d.toString()));
  child.stderr!.on('data', (d: Buffer) => (output += d.toString()));
  const deadline = Date.now() + 60_000;
  while (!output.includes('Blockwright is serving')) {
    if (child.exitCode !== null) throw new Error(`server exited early:\n${output}`);
    if (Date.now() > deadline) throw new Error(`server did not start:\n${output}`);
    await new Promise((r) => setTimeout(r, 100));
  }
  return { child, url: `http://127.0.0.1:${port}`, output: () => output };
}

function interrupt(r: Running): Promise<number | null> {
  return new Promise((resolve) => {
    r.child.once('exit', (code) => resolve(code));
    r.child.kill('SIGINT');
  });
}

/** pg_ctl status: 0 when a server runs on that data folder, 3 when none does. */
function clusterStatus(): number {
  const bin = findServerBin()!;
  const data = path.join(dataDir, 'postgres', 'data');
  const [cmd, args] = isRoot()
    ? ['runuser', ['-u', 'postgres', '--', path.join(bin, 'pg_ctl'), 'status', '-D', data]]
    : [path.join(bin, 'pg_ctl'), ['status', '-D', data]];
  return spawnSync(cmd as string, args as string[], { cwd: '/' }).status ?? -1;
}

describe('npm start lifecycle', () => {
  it('when interrupted, then its PostgreSQL stops; when started again, then the data is still there', async () => {
    const port = await freePort();
    const pgPort = await freePort();

    const first = await startServer(port, pgPort);
    expect(first.output()).toContain('Seeded the demo studio');
    const agent = request.agent(first.url);
    await agent.get('/api/health').expect(200);
    const token = (await agent.get('/api/auth/csrf').expect(200)).body.csrfToken as string;
    await agent
      .post('/api/auth/sign-up')
      .set('x-csrf-token', token)
      .send({ email: 'kept@example.org', displayName: 'Kept', password: 'kept across restarts' })
      .expect(201);
    expect(clusterStatus()).toBe(0);

    expect(await interrupt(first)).toBe(0);
    expect(clusterStatus()).toBe(3);
    expect(first.output()).toContain('PostgreSQL stopped');

    const second = await startServer(port, pgPort);
    try {
      expect(second.output()).not.toContain('Seeded the demo studio');
      expect(second.output()).not.toContain('Creating a PostgreSQL cluster');
      const again = request.agent(second.url);
      const t2 = (await again.get('/api/auth/csrf').expect(200)).body.csrfToken as string;
      const res = await again
        .post('/api/auth/sign-in')
        .set('x-csrf-token', t2)
        .send({ email: 'kept@example.org', password: 'kept across restarts' });
      expect(res.status).toBe(200);
    } finally {
      expect(await interrupt(second)).toBe(0);
    }
    expect(clusterStatus()).toBe(3);
  }, 120_000);
});
