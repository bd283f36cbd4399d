import { mkdirSync } from 'node:fs';

export type FakeS3 = { endpoint: string; port: number; close: () => Promise<void> };

/** The fake's fixed keys: s3rver accepts only these (it checks signatures like the real service). */
export const FAKE_S3_CREDENTIALS = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' } as const;

/**
 * A local S3 on loopback for `npm start` (STORAGE_DRIVER=s3 without S3_ENDPOINT) and the tests:
 * objects are files under `directory`, the bucket is made on start. Nothing leaves the machine.
 */
export async function startFakeS3(opts: { port: number; directory: string; bucket: string }): Promise<FakeS3> {
  mkdirSync(opts.directory, { recursive: true });
  // Loaded only when the fake runs: a server on a real bucket never loads it.
  const { default: S3rver } = await import('s3rver');
  const server = new S3rver({ port: opts.port, address: '127.0.0.1', directory: opts.directory, silent: true, configureBuckets: [{ name: opts.bucket, configs: [] }] });
  const address = await server.run();
  const endpoint = `http://127.0.0.1:${address.port}`;
  return { endpoint, port: address.port, close: () => server.close() };
}
