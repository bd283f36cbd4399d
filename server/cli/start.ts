// `npm start`: database, migrations, demo scenario, client build when stale, then the server.
import { prepare } from './prepare';
import { buildClientIfStale } from './build-client';
import { startFakeS3IfWanted } from '../storage/index';

// The fake S3 (STORAGE_DRIVER=s3 without an endpoint) must listen before the demo stores its photos.
await startFakeS3IfWanted();
await prepare();
buildClientIfStale();
await import('./serve');
