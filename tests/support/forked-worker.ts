// A job worker (`npm run worker`, server/cli/worker.ts itself) in a child process: for tests of several
// processes sharing one queue. Resolves once it works the queue; keeps what it printed.
import { fork, type ChildProcess } from 'node:child_process';
import path from 'node:path';

export type ForkedWorker = {
  child: ChildProcess;
  pid: number;
  output: () => string;
  /** Resolves with how it ended: an exit code, or the signal that killed it. */
  exited: Promise<{ code: number | null; signal: NodeJS.Signals | null }>;
};

export async function forkWorker(env: Record<string, string>): Promise<ForkedWorker> {
  let output = '';
  const child = fork(path.resolve('server/cli/worker.ts'), [], {
    execArgv: ['--import', 'tsx'],
    env: { ...process.env, TSX_TSCONFIG_PATH: 'server/tsconfig.runtime.json', NODE_ENV: 'test', DEMO_MODE: 'false', LOG_LEVEL: 'warn', ...env },
    stdio: ['ignore', 'pipe', 'pipe', 'ipc'],
  });
  const exited = new Promise<{ code: number | null; signal: NodeJS.Signals | null }>((resolve) => child.once('exit', (code, signal) => resolve({ code, signal })));
  await new Promise<void>((resolve, reject) => {
    child.stdout!.on('data', (c: Buffer) => {
      output += c.toString();
      if (output.includes('is working the queue')) resolve();
    });
    child.stderr!.on('data', (c: Buffer) => (output += c.toString()));
    void exited.then(({ code, signal }) => reject(new Error(`the worker ended (${code ?? signal}) before working the queue:\n${output}`)));
  });
  return { child, pid: child.pid!, output: () => output, exited };
}
