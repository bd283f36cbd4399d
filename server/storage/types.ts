import type { Readable } from 'node:stream';

/** A stored object as read back: its bytes as a stream, and what to send with them. */
export type StoredObject = { body: Readable; contentType: string; size: number };

/**
 * Where uploaded files live. Shaped like an object store (flat keys such as
 * `photos/<storageKey>-960.webp`, whole objects written at once) so an S3 driver can
 * stand in for the local disk without the callers changing.
 */
export interface Storage {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  /** null when no object has that key. */
  get(key: string): Promise<StoredObject | null>;
  /** Deleting a missing key is not an error (as in S3). */
  delete(key: string): Promise<void>;
  exists(key: string): Promise<boolean>;
  /** Keys that start with `prefix` (S3: ListObjectsV2 with Prefix). */
  list(prefix: string): Promise<string[]>;
}

/** Keys are relative, slash-separated, made of safe characters and never climb out with `..`. */
const KEY = /^[a-z0-9][a-z0-9_-]*(?:\/[a-z0-9][a-z0-9_.-]*)*$/;

export function assertValidKey(key: string): void {
  if (key.length > 200 || !KEY.test(key) || key.split('/').some((part) => part === '..' || part === '.')) {
    throw new Error(`Invalid storage key: ${JSON.stringify(key)}`);
  }
}
