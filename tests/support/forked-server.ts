// A Placard server in a child process of its own, on the database named by DATABASE_URL: for tests
// and benchmarks that must not share a thread (or a database) with the test runner. The child
// migrates, adds one owner with a complete published build, listens on a free port and reports.
import { fork, type ChildProcess } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import type { AddressInfo } from 'node:net';

export type ForkedServerInfo = { port: number; code: string; buildId: number; email: string; password: string };
export type ForkedServer = ForkedServerInfo & { child: ChildProcess; base: string; output: () => string; stop: () => Promise<void> };

/** Starts the child with this environment on top of the parent's; resolves once it listens. */
export async function forkServer(env: Record<string, string>): Promise<ForkedServer> {
  let output = '';
  const child = fork(fileURLToPath(import.meta.url), ['--serve'], {
    execArgv: ['--import', 'tsx'],
    // The runtime tsconfig (as under npm start): JSX pages render with React's automatic runtime.
    env: { ...process.env, TSX_TSCONFIG_PATH: 'server/tsconfig.runtime.json', NODE_ENV: 'test', DEMO_MODE: 'false', LOG_LEVEL: 'warn', API_RATE_LIMIT_PER_MINUTE: '1000000', ...env },
    stdio: ['ignore', 'pipe', 'pipe', 'ipc'],
  });
  child.stdout!.on('data', (c: Buffer) => (output += c.toString()));
  child.stderr!.on('data', (c: Buffer) => (output += c.toString()));
  const info = await new Promise<ForkedServerInfo>((resolve, reject) => {
    child.once('message', (m) => resolve(m as ForkedServerInfo));
    child.once('exit', (code) => reject(new Error(`server exited with ${code} before listening:\n${output}`)));
  });
  return {
    ...info,
    child,
    base: `http://127.0.0.1:${info.port}`,
    output: () => output,
    stop: () =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null || child.signalCode !== null) return resolve();
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      }),
  };
}

async function serve(): Promise<void> {
  // As under npm start (cli/serve.ts).
  (await import('@server/process-guard')).keepRunningThroughDatabaseLoss();
  await import('@server/models/index');
  const { migrate } = await import('@server/db/migrator');
  await migrate();
  const { createUser } = await import('./factories');
  const { createFullBuild } = await import('./build-factory');
  const { user, email, password } = await createUser({ name: 'Forked Owner' });
  const build = await createFullBuild(user.id);
  const { listen, closeConnections } = await import('@server/index');
  // Tests that must see every request consult the database ask for it (0: no second of trust).
  if (process.env.PAGE_REVALIDATE_MS) {
    const trust = Number(process.env.PAGE_REVALIDATE_MS);
    Object.assign((await import('@server/pages/page-cache')).publicPageCache, { revalidateAfterMs: trust, trustWhileListeningMs: trust });
  }
  const server = await listen(0, '127.0.0.1');
  // The job queue's own pool lives through the same outages as the server's (as under npm start).
  await (await import('@server/jobs/send-mail')).startMailWorker();
  const info: ForkedServerInfo = { port: (server.address() as AddressInfo).port, code: build.code, buildId: build.id, email, password };
  process.send!(info);
  const stop = async () => {
    server.close();
    server.closeAllConnections();
    await closeConnections();
    process.exit(0);
  };
  process.on('SIGTERM', stop);
  process.on('disconnect', stop);
}

if (process.argv.includes('--serve')) await serve();
