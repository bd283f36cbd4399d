// `npm run storage:copy-to-s3`: copies the local store (STORAGE_DIR, default .data/uploads) into the
// S3 bucket that STORAGE_DRIVER=s3 and the S3_* settings name, before switching a server over.
import { config } from '../config';
import { copyLocalStoreInto } from '../storage/copy-local';
import { startFakeS3IfWanted, storage } from '../storage/index';

if (!config.objectStorage) {
  console.error('Set STORAGE_DRIVER=s3 and the S3_* settings of the bucket to copy into.');
  process.exit(1);
}
const fake = await startFakeS3IfWanted();
console.log(`Copying ${config.storageDir} into bucket "${config.objectStorage.bucket}"…`);
const { copied, skipped } = await copyLocalStoreInto(config.storageDir, storage, console.log);
console.log(`Done: ${copied} copied, ${skipped} already there.`);
await fake?.close();
