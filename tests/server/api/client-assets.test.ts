import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { testApp } from '../../support/api-client';

// npm test builds the client first (tests/support/run-all.ts), with its compressed copies.
const indexHtml = readFileSync(path.resolve(import.meta.dirname, '../../../dist/client/index.html'), 'utf8');
const scriptUrl = /<script[^>]+src="(\/assets\/[^"]+\.js)"/.exec(indexHtml)?.[1];
const styleUrl = /<link[^>]+href="(\/assets\/[^"]+\.css)"/.exec(indexHtml)?.[1];

describe('the app’s JavaScript and CSS', () => {
  it.each([
    ['script', scriptUrl, /javascript/],
    ['stylesheet', styleUrl, /css/],
  ])('the %s is sent as the brotli or gzip copy made at build time, cached for a year', async (_what, url, type) => {
    expect(url).toBeTruthy();
    for (const [accept, encoding] of [
      ['br, gzip', 'br'],
      ['gzip', 'gzip'],
    ] as const) {
      const res = await request(testApp()).get(url!).set('Accept-Encoding', accept).buffer(true);
      expect(res.status).toBe(200);
      expect(res.headers['content-encoding']).toBe(encoding);
      expect(res.headers['content-type']).toMatch(type);
      expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
      expect(res.headers.vary).toMatch(/Accept-Encoding/);
    }
    const plain = await request(testApp()).get(url!).set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
  });

  it('answers 404 for an asset that does not exist', async () => {
    const res = await request(testApp()).get('/assets/no-such-file-0000.js').set('Accept-Encoding', 'br');
    expect(res.status).toBe(404);
  });
});
