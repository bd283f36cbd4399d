import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import express from 'express';
import { testApp } from '../../support/api-client';
import { sendCompressedJson } from '@server/middlewares/send-compressed';
import { CLIENT_DIST, SCREEN_MODULES } from '@server/client-shell';

// npm test builds the client first; the manifest is the build's own account of which file holds which screen.
const DIST = CLIENT_DIST;
type Chunk = { file: string; isEntry?: boolean; imports?: string[]; dynamicImports?: string[]; css?: string[] };
const manifest = JSON.parse(readFileSync(path.join(DIST, '.vite/manifest.json'), 'utf8')) as Record<string, Chunk>;
const router = readFileSync(path.resolve(import.meta.dirname, '../../../client/src/app/router.tsx'), 'utf8');

// The server's own list of lazy screens: each must be a chunk of the build and a lazy import of the router.
const SCREENS = SCREEN_MODULES;

/**
 * Every file a screen may load, its dynamic imports included (not the entry's: those are the app's other
 * screens), walked here from the manifest on its own.
 */
function everythingOf(key: string, seen = new Set<string>()): Set<string> {
  if (seen.has(key)) return seen;
  seen.add(key);
  const chunk = manifest[key]!;
  for (const next of [...(chunk.imports ?? []), ...(chunk.isEntry ? [] : (chunk.dynamicImports ?? []))]) everythingOf(next, seen);
  return seen;
}
const filesOf = (keys: string[]) => new Set(keys.flatMap((k) => [...everythingOf(k)]).flatMap((k) => [manifest[k]!.file, ...(manifest[k]!.css ?? [])]).map((f) => `/${f}`));

const page = async (address: string) => {
  const res = await request(testApp()).get(address).set('Accept-Encoding', 'identity');
  expect(res.status, address).toBe(200);
  expect(res.headers['content-type']).toMatch(/html/);
  return res;
};
const modulepreloads = (html: string) => [...html.matchAll(/<link rel="modulepreload" crossorigin href="([^"]+)">/g)].map((m) => m[1]!);
const fetchPreloads = (html: string) => [...html.matchAll(/<link rel="preload" as="fetch" crossorigin href="([^"]+)">/g)].map((m) => m[1]!);
const named = (html: string) => new Set([...html.matchAll(/"(\/assets\/[^"]+)"/g)].map((m) => m[1]!));

describe('the page the server sends for an app address', () => {
  it('names the chunks of the screen at that address, and preloads the answer the screen opens with', async () => {
    for (const key of Object.values(SCREENS)) {
      expect(manifest[key], key).toBeDefined();
      // The router loads each of these as a lazy screen (its own chunk), so the server's list stays true.
      expect(router).toContain(`import('@client/${key.replace(/^src\//, '').replace(/\.tsx$/, '')}')`);
    }
    const cars = (await page('/judge/12')).text;
    expect(modulepreloads(cars)).toEqual(expect.arrayContaining([`/${manifest[SCREENS.judgeLayout]!.file}`, `/${manifest[SCREENS.judgeCars]!.file}`]));
    expect(modulepreloads(cars)).not.toContain(`/${manifest[SCREENS.scoreSheet]!.file}`);
    expect(fetchPreloads(cars)).toEqual(['/api/events/12/judging/mine']);

    const gate = (await page('/gate/7')).text;
    expect(modulepreloads(gate)).toContain(`/${manifest[SCREENS.gate]!.file}`);
    expect(fetchPreloads(gate)).toEqual(['/api/events/7']);

    const signIn = await page('/sign-in');
    expect(modulepreloads(signIn.text)).toContain(`/${manifest[SCREENS.signIn]!.file}`);
    expect(modulepreloads(signIn.text)).not.toContain(`/${manifest[SCREENS.gate]!.file}`);
    // Sign-in, like every screen in the app layout, reads the session first.
    expect(fetchPreloads(signIn.text)).toEqual(['/api/session']);
    expect(fetchPreloads((await page('/shows/3')).text)).toEqual(['/api/session']);
    expect(signIn.text).not.toContain('placard-offline-assets');
    // The same for everyone (no session read, nothing personal), revalidated on each visit.
    expect(signIn.headers['cache-control']).toBe('no-cache');
    expect(signIn.headers['set-cookie']).toBeUndefined();

    // Only digits reach a preload: anything else gets the page without one.
    expect(fetchPreloads((await page('/judge/12%22%3E')).text)).toEqual([]);
    expect(fetchPreloads((await page('/gate/7x')).text)).toEqual([]);
  });

  it('paints its opening text without waiting for the stylesheet', async () => {
    const { text } = await page('/judge/12');
    expect(text).toMatch(/<link rel="preload" as="style" crossorigin href="\/assets\/[^"]+\.css">/);
    expect(text).not.toMatch(/rel="stylesheet"/);
    expect(text).toMatch(/<style>[^<]*\.opening\{/);
    expect(text).toContain('<main class="opening">');
  });

  it('lists every chunk of the judges’ and the gate’s screens in the page their service worker keeps', async () => {
    const areas = { '/judge': [SCREENS.judgeLayout, SCREENS.judgeHome, SCREENS.judgeCars, SCREENS.scoreSheet], '/gate': [SCREENS.gate] };
    for (const [address, screens] of Object.entries(areas)) {
      const kept = named((await page(address)).text);
      const needed = filesOf(['index.html', ...screens]);
      expect([...needed].filter((f) => !kept.has(f)), address).toEqual([]);
      for (const file of kept) expect(existsSync(path.join(DIST, file)), file).toBe(true);
    }
    // The gate's worker keeps the QR decoder and the walk-up form, which load after the screen is up.
    const gate = named((await page('/gate')).text);
    expect([...gate].some((f) => f.includes('jsQR'))).toBe(true);
    expect([...gate].some((f) => f.includes('walk-up-form'))).toBe(true);
  });

  it('is sent compressed to a browser that takes it', async () => {
    const res = await request(testApp()).get('/gate/7').set('Accept-Encoding', 'gzip, deflate, br').buffer(true);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers.vary).toMatch(/Accept-Encoding/);
    expect(res.text).toContain('/api/events/7');
  });

  it('compresses the JSON a phone waits for (the judge’s cars, the gate’s roster) once that is worth it', async () => {
    const app = express().get('/view', (req, res) => sendCompressedJson(req, res, { cars: Array.from({ length: Number(req.query.cars) }, (_, i) => ({ number: i + 1, title: `Car ${i + 1}` })) }));
    const get = (cars: number, encoding: string) => request(app).get(`/view?cars=${cars}`).set('Accept-Encoding', encoding);
    const big = await get(60, 'gzip, deflate, br');
    expect(big.headers['content-encoding']).toBe('br');
    expect(big.headers['content-type']).toMatch(/json/);
    expect(big.headers.vary).toMatch(/Accept-Encoding/);
    expect(big.body.cars).toHaveLength(60);
    expect((await get(60, 'gzip, deflate')).headers['content-encoding']).toBe('gzip');
    const plain = await get(60, 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.body.cars[59]).toEqual({ number: 60, title: 'Car 60' });
    // Under 1 KB the headers would cost more than they save.
    expect((await get(2, 'gzip, deflate, br')).headers['content-encoding']).toBeUndefined();
  });
});
