import type { Readable } from 'node:stream';
import { DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, ListObjectsV2Command, PutObjectCommand, S3Client, type S3ClientConfig } from '@aws-sdk/client-s3';
import { assertValidKey, type Storage } from './types';
import { contentTypeOfKey } from './content-types';

export type S3Settings = {
  bucket: string;
  endpoint: string | null;
  region: string;
  accessKeyId: string | null;
  secretAccessKey: string | null;
  forcePathStyle: boolean;
};

/** The SDK client: bounded waits (a hung bucket answers 503 through the error handler, not a stuck request). */
export function s3ClientFor(s: S3Settings): S3Client {
  const options: S3ClientConfig = {
    region: s.region,
    forcePathStyle: s.forcePathStyle,
    maxAttempts: 3,
    requestHandler: { connectionTimeout: 3_000, requestTimeout: 15_000 },
    ...(s.endpoint ? { endpoint: s.endpoint } : {}),
    ...(s.accessKeyId && s.secretAccessKey ? { credentials: { accessKeyId: s.accessKeyId, secretAccessKey: s.secretAccessKey } } : {}),
  };
  return new S3Client(options);
}

const notFound = (err: unknown) => {
  const e = err as { name?: string; $metadata?: { httpStatusCode?: number } };
  return e?.name === 'NoSuchKey' || e?.name === 'NotFound' || e?.$metadata?.httpStatusCode === 404;
};

/**
 * The same flat keys as the local disk, as objects in one bucket. A PUT is whole or absent, so no
 * reader sees half an object; `list` answers one level like a folder listing (S3's Delimiter).
 */
export function s3Storage(client: S3Client, bucket: string): Storage {
  return {
    async put(key, body, contentType) {
      assertValidKey(key);
      if (contentType !== contentTypeOfKey(key)) throw new Error(`Content type ${contentType} does not match the key ${key}`);
      await client.send(new PutObjectCommand({ Bucket: bucket, Key: key, Body: body, ContentType: contentType }));
    },

    async get(key) {
      assertValidKey(key);
      try {
        const out = await client.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
        return { body: out.Body as Readable, contentType: out.ContentType ?? contentTypeOfKey(key), size: out.ContentLength ?? 0 };
      } catch (err) {
        if (notFound(err)) return null;
        throw err;
      }
    },

    async delete(key) {
      assertValidKey(key);
      await client.send(new DeleteObjectCommand({ Bucket: bucket, Key: key }));
    },

    async exists(key) {
      assertValidKey(key);
      try {
        await client.send(new HeadObjectCommand({ Bucket: bucket, Key: key }));
        return true;
      } catch (err) {
        if (notFound(err)) return false;
        throw err;
      }
    },

    async list(prefix) {
      const keys: string[] = [];
      let token: string | undefined;
      do {
        const out = await client.send(new ListObjectsV2Command({ Bucket: bucket, Prefix: prefix, Delimiter: '/', ContinuationToken: token }));
        for (const o of out.Contents ?? []) if (o.Key) keys.push(o.Key);
        for (const p of out.CommonPrefixes ?? []) if (p.Prefix) keys.push(p.Prefix.replace(/\/$/, ''));
        token = out.IsTruncated ? out.NextContinuationToken : undefined;
      } while (token);
      return keys;
    },
  };
}
