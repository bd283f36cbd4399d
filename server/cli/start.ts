// `npm start`: database, migrations, demo scenario, client build when stale, then the server.
import { prepare } from './prepare';
import { buildClientIfStale } from './build-client';

await prepare();
buildClientIfStale();
await import('./serve');
