import { config } from '../config';
import { localDiskStorage } from './local-disk';
import type { Storage } from './types';

export type { Storage, StoredObject } from './types';

/** The one storage the app uses: the local disk for now; an S3 driver will be chosen here by config. */
export const storage: Storage = localDiskStorage(config.storageDir);
