import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Readable } from 'node:stream';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { localDiskStorage } from '@server/storage/local-disk';
import { s3ClientFor, s3Storage } from '@server/storage/s3';
import { FAKE_S3_CREDENTIALS, startFakeS3, type FakeS3 } from '@server/storage/fake-s3';
import type { Storage } from '@server/storage/types';
import { copyLocalStoreInto } from '@server/storage/copy-local';

// The one storage contract, run against both drivers: whatever the config chooses, uploads, card
// caches and bulk PDFs behave the same. The S3 driver talks to a fake S3 (s3rver) on loopback.

const read = async (body: Readable) => {
  const chunks: Buffer[] = [];
  for await (const c of body) chunks.push(Buffer.from(c as Buffer));
  return Buffer.concat(chunks);
};

const root = mkdtempSync(path.join(tmpdir(), 'placard-storage-'));
let fake: FakeS3;
const drivers: Record<string, () => Storage> = {};

beforeAll(async () => {
  fake = await startFakeS3({ port: 0, directory: path.join(root, 's3'), bucket: 'placard-contract' });
  const client = s3ClientFor({ bucket: 'placard-contract', endpoint: fake.endpoint, region: 'us-east-1', forcePathStyle: true, ...FAKE_S3_CREDENTIALS });
  drivers.s3 = () => s3Storage(client, 'placard-contract');
  drivers['local disk'] = () => localDiskStorage(path.join(root, 'disk'));
});
afterAll(async () => {
  await fake?.close();
  rmSync(root, { recursive: true, force: true });
});

describe.each(['local disk', 's3'])('the %s driver', (name) => {
  it('keeps an object whole, types it by its key, lists one level and forgets it on delete', async () => {
    const storage = drivers[name]!();
    const bytes = Buffer.from('%PDF-1.7 not really a pdf, but bytes all the same');
    expect(await storage.get('cards/sets/one.pdf')).toBeNull();
    expect(await storage.exists('cards/sets/one.pdf')).toBe(false);
    await storage.put('cards/sets/one.pdf', bytes, 'application/pdf');
    await storage.put('cards/sets/two.pdf', bytes, 'application/pdf');
    await storage.put('cards/sets/deeper/three.pdf', bytes, 'application/pdf');
    const got = (await storage.get('cards/sets/one.pdf'))!;
    expect(got.contentType).toBe('application/pdf');
    expect(got.size).toBe(bytes.length);
    expect(await read(got.body)).toEqual(bytes);
    expect(await storage.exists('cards/sets/one.pdf')).toBe(true);
    expect((await storage.list('cards/sets/')).sort()).toEqual(['cards/sets/deeper', 'cards/sets/one.pdf', 'cards/sets/two.pdf']);
    expect(await storage.list('cards/sets/t')).toEqual(['cards/sets/two.pdf']);
    await storage.delete('cards/sets/one.pdf');
    await storage.delete('cards/sets/one.pdf'); // a missing key is no error
    expect(await storage.get('cards/sets/one.pdf')).toBeNull();
  });

  it('refuses a key that climbs out or a type that does not match the key', async () => {
    const storage = drivers[name]!();
    await expect(storage.put('../escape.pdf', Buffer.from('x'), 'application/pdf')).rejects.toThrow(/Invalid storage key/);
    await expect(storage.put('photos/a.webp', Buffer.from('x'), 'image/jpeg')).rejects.toThrow(/does not match/);
    await expect(storage.get('photos/../../etc/passwd')).rejects.toThrow(/Invalid storage key/);
  });
});

describe('moving a local store into a bucket', () => {
  it('copies every object key for key, and a second run copies nothing again', async () => {
    const source = localDiskStorage(path.join(root, 'to-move'));
    const photo = Buffer.from('webp bytes');
    await source.put('photos/abc-480.webp', photo, 'image/webp');
    await source.put('cards/sets/print-1.pdf', Buffer.from('pdf bytes'), 'application/pdf');
    const bucket = drivers.s3!();
    expect(await copyLocalStoreInto(path.join(root, 'to-move'), bucket)).toEqual({ copied: 2, skipped: 0 });
    expect(await read((await bucket.get('photos/abc-480.webp'))!.body)).toEqual(photo);
    expect((await bucket.get('cards/sets/print-1.pdf'))!.contentType).toBe('application/pdf');
    expect(await copyLocalStoreInto(path.join(root, 'to-move'), bucket)).toEqual({ copied: 0, skipped: 2 });
  });
});
