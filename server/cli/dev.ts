// `npm run dev`: the server under watch on PORT and Vite's dev server (hot reload) proxying to it.
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { prepare } from './prepare';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
await prepare();
const { sequelize } = await import('../db/sequelize');
await sequelize.close();

const children: ChildProcess[] = [
  spawn(path.join(ROOT, 'node_modules/.bin/tsx'), ['watch', '--clear-screen=false', 'server/cli/serve.ts'], { cwd: ROOT, stdio: 'inherit' }),
  spawn(process.execPath, [path.join(ROOT, 'node_modules/vite/bin/vite.js')], { cwd: ROOT, stdio: 'inherit' }),
];
console.log('Open http://127.0.0.1:5173 for the client with hot reload (API on the server port).');
const stopAll = () => children.forEach((c) => c.kill('SIGTERM'));
process.on('SIGINT', stopAll);
process.on('SIGTERM', stopAll);
children.forEach((c) => c.on('exit', (code) => { stopAll(); process.exitCode = code ?? 0; }));
