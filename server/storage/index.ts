import { config, PROJECT_ROOT } from '../config';
import { localDiskStorage } from './local-disk';
import { s3ClientFor, s3Storage } from './s3';
import path from 'node:path';
import { FAKE_S3_CREDENTIALS, startFakeS3, type FakeS3 } from './fake-s3';
import type { Storage } from './types';

export type { Storage, StoredObject } from './types';

let fakeEndpoint: string | undefined;
let chosen: Storage | undefined;

/** Points the S3 driver at the local fake once it listens (`npm start` and the tests start it). */
export function pointStorageAtFakeS3(endpoint: string | undefined): void {
  fakeEndpoint = endpoint;
  chosen = undefined;
}

function current(): Storage {
  if (chosen) return chosen;
  const s3 = config.objectStorage;
  if (!s3) return (chosen = localDiskStorage(config.storageDir));
  if (s3.fake && !fakeEndpoint) throw new Error('Storage: STORAGE_DRIVER=s3 has no S3_ENDPOINT and the local fake S3 is not running.');
  const settings = s3.fake ? { ...s3, endpoint: fakeEndpoint!, ...FAKE_S3_CREDENTIALS, forcePathStyle: true } : s3;
  return (chosen = s3Storage(s3ClientFor(settings), s3.bucket));
}

/** The one storage the app uses, chosen by config (`STORAGE_DRIVER`): the local disk or an S3 bucket. */
export const storage: Storage = {
  put: (key, body, contentType) => current().put(key, body, contentType),
  get: (key) => current().get(key),
  delete: (key) => current().delete(key),
  exists: (key) => current().exists(key),
  list: (prefix) => current().list(prefix),
};

let runningFake: Promise<FakeS3 | undefined> | undefined;

/**
 * With STORAGE_DRIVER=s3 and no S3_ENDPOINT (outside production), starts the local fake S3 once per
 * process, before anything stores a file (the demo's photos too). A port already taken is taken to
 * be another Placard's fake, and used.
 */
export function startFakeS3IfWanted(): Promise<FakeS3 | undefined> {
  const s3 = config.objectStorage;
  if (!s3?.fake) return Promise.resolve(undefined);
  runningFake ??= startFakeS3({ port: s3.fakePort, directory: path.join(PROJECT_ROOT, '.data', 'fake-s3'), bucket: s3.bucket })
    .then((fake) => {
      pointStorageAtFakeS3(fake.endpoint);
      return fake;
    })
    .catch((err: NodeJS.ErrnoException) => {
      if (err.code !== 'EADDRINUSE') throw err;
      pointStorageAtFakeS3(`http://127.0.0.1:${s3.fakePort}`);
      return undefined;
    });
  return runningFake;
}
