import { afterAll, describe, expect, it, vi } from 'vitest';
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { createServer, type AddressInfo, type Server } from 'node:net';
import path from 'node:path';
import pg from 'pg';
import { config } from '@server/config';
import { ensureDatabase } from '@server/db/cluster';
import { uniqueEmail } from '../../support/factories';

// The whole server as npm start runs it (server/cli/serve.ts, demo mode), started while another
// program holds MAIL_CATCHER_PORT: it says so at start, its catcher listens on a free port, and the
// mail it sends lands in its own Caught mail, never with whatever holds the port. It runs on a
// database of its own, so its mail can only have come through its own queue and catcher.
const ROOT = path.resolve(import.meta.dirname, '../../..');
const DB = 'placard_test_catcher_taken';
const databaseUrl = config.databaseUrl.replace(/\/[^/]+$/, `/${DB}`);

const freePort = () =>
  new Promise<number>((resolve) => {
    const s = createServer().listen(0, '127.0.0.1', () => {
      const { port } = s.address() as AddressInfo;
      s.close(() => resolve(port));
    });
  });

describe('npm start when the mail catcher’s port is taken', () => {
  let squatter: Server | undefined;
  let child: ChildProcess | undefined;
  let output = '';
  afterAll(async () => {
    if (child && child.exitCode === null) {
      const exited = new Promise((r) => child!.once('exit', r));
      child.kill('SIGTERM');
      await exited;
    }
    await new Promise((r) => (squatter ? squatter.close(r) : r(undefined)));
  });

  it('says so, catches its mail on a free port, and nothing reaches the program on the port', async () => {
    let connectionsToSquatter = 0;
    squatter = await new Promise<Server>((resolve) => {
      const s = createServer((socket) => {
        connectionsToSquatter++;
        socket.destroy();
      }).listen(0, '127.0.0.1', () => resolve(s));
    });
    const taken = (squatter.address() as AddressInfo).port;

    await ensureDatabase(undefined, [DB]);
    const env = { ...process.env, TSX_TSCONFIG_PATH: 'server/tsconfig.runtime.json', DB_NAME: DB, DATABASE_URL: '', SMTP_URL: '', MAIL_CATCHER_PORT: String(taken), DEMO_MODE: 'true', LOG_LEVEL: 'warn' };
    const tsx = path.join(ROOT, 'node_modules/.bin/tsx');
    const migrated = spawnSync(tsx, ['server/db/migrate-cli.ts'], { cwd: ROOT, env, encoding: 'utf8' });
    expect(migrated.status, migrated.stderr).toBe(0);

    const port = await freePort();
    child = spawn(tsx, ['server/cli/serve.ts'], { cwd: ROOT, env: { ...env, PORT: String(port), PAYMENTS_FAKE_PORT: String(await freePort()) }, stdio: ['ignore', 'pipe', 'pipe'] });
    child.stdout!.on('data', (c: Buffer) => (output += c.toString()));
    child.stderr!.on('data', (c: Buffer) => (output += c.toString()));
    await vi.waitFor(() => expect(output).toContain('Placard is running on'), { timeout: 60_000, interval: 200 });
    expect(output).toMatch(new RegExp(`port ${taken} was taken, so the mail catcher listens on \\d+`));
    expect(output).toMatch(new RegExp(`Port ${taken} \\(MAIL_CATCHER_PORT\\) is taken by another program`));

    // Signing up sends a confirmation e-mail: it must reach this server's own catcher.
    const base = `http://127.0.0.1:${port}`;
    const first = await fetch(`${base}/api/session`);
    const cookie = first.headers.get('set-cookie')?.split(';')[0] ?? '';
    const { csrfToken } = (await first.json()) as { csrfToken: string };
    const email = uniqueEmail('taken-port');
    const signUp = await fetch(`${base}/api/users`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'x-csrf-token': csrfToken, cookie },
      body: JSON.stringify({ email, name: 'Port Tester', password: 'correct horse battery' }),
    });
    expect(signUp.status, output).toBe(202);

    const db = new pg.Client({ connectionString: databaseUrl });
    await db.connect();
    try {
      await vi.waitFor(
        async () => {
          const { rows } = await db.query<{ subject: string }>('SELECT subject FROM caught_mails WHERE "to" ILIKE $1', [`%${email}%`]);
          expect(rows.length, output).toBe(1);
        },
        { timeout: 60_000, interval: 250 },
      );
    } finally {
      await db.end();
    }
    expect(connectionsToSquatter).toBe(0);
  });
});
