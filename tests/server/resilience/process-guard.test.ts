import { describe, expect, it } from 'vitest';
import { fork } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const child = fileURLToPath(new URL('../../support/guarded-child.ts', import.meta.url));

function run(kind: 'db' | 'bug'): Promise<{ code: number | null; said: unknown[] }> {
  return new Promise((resolve) => {
    const said: unknown[] = [];
    const p = fork(child, [kind], { execArgv: ['--import', 'tsx'], env: { ...process.env, LOG_LEVEL: 'silent' }, stdio: ['ignore', 'ignore', 'ignore', 'ipc'] });
    p.on('message', (m) => said.push(m));
    p.on('exit', (code) => resolve({ code, said }));
  });
}

describe('the server process when a database connection dies outside a query', () => {
  it('keeps running after an unhandled connection-loss error (the killed-postmaster case)', async () => {
    expect(await run('db')).toEqual({ code: 0, said: ['still running'] });
  });

  it('still stops on any other uncaught exception', async () => {
    const { code, said } = await run('bug');
    expect(code).toBe(1);
    expect(said).toEqual([]);
  });
});
