import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync, mkdirSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import { moveSourceMaps, viteBuildEnv } from '@server/cli/build-client';
import { testApp } from '../support/api-client';
import { listenApp, rawGet } from '../support/raw-http';

const DIST = path.resolve('dist/client');
const filesUnder = (dir: string): string[] => readdirSync(dir).flatMap((name) => (statSync(path.join(dir, name)).isDirectory() ? filesUnder(path.join(dir, name)) : [path.join(dir, name)]));

describe('the built client as served', () => {
  it('is built for production whatever NODE_ENV a person exported, with the judges’ service worker registered', () => {
    expect(viteBuildEnv({ NODE_ENV: 'development', PATH: '/bin' })).toMatchObject({ NODE_ENV: 'production', PATH: '/bin' });
    expect(viteBuildEnv({})).toMatchObject({ NODE_ENV: 'production' });
    // The build the suite serves registers the workers: a development build leaves the registration out.
    const scripts = filesUnder(path.join(DIST, 'assets')).filter((f) => f.endsWith('.js'));
    expect(scripts.some((f) => readFileSync(f, 'utf8').includes('/judge-sw.js'))).toBe(true);
    expect(scripts.some((f) => readFileSync(f, 'utf8').includes('/gate-sw.js'))).toBe(true);
  });

  it('keeps source maps out of the served folder, and refuses one that strays in', async () => {
    expect(filesUnder(DIST).filter((f) => f.endsWith('.map'))).toEqual([]);
    const script = readdirSync(path.join(DIST, 'assets')).find((f) => f.endsWith('.js'))!;
    expect(readFileSync(path.join(DIST, 'assets', script), 'utf8')).not.toMatch(/sourceMappingURL/);
    expect((await request(testApp()).get(`/assets/${script}.map`)).status).toBe(404);
    const stray = path.join(DIST, `stray-${process.pid}.js.map`);
    writeFileSync(stray, '{"version":3}');
    try {
      const answer = await request(testApp()).get(`/${path.basename(stray)}`);
      expect(answer.status).toBe(404);
      expect(answer.text).not.toContain('version');
    } finally {
      rmSync(stray, { force: true });
    }

    // The build moves each map beside the served folder, keeping its path.
    const from = mkdtempSync(path.join(os.tmpdir(), 'maps-from-'));
    const to = path.join(mkdtempSync(path.join(os.tmpdir(), 'maps-to-')), 'maps');
    mkdirSync(path.join(from, 'assets'));
    writeFileSync(path.join(from, 'assets', 'a.js'), 'x');
    writeFileSync(path.join(from, 'assets', 'a.js.map'), '{}');
    expect(moveSourceMaps(from, to)).toBe(1);
    expect(existsSync(path.join(from, 'assets', 'a.js.map'))).toBe(false);
    expect(existsSync(path.join(from, 'assets', 'a.js'))).toBe(true);
    expect(existsSync(path.join(to, 'assets', 'a.js.map'))).toBe(true);
  });

  it('sends each service worker compressed to a browser that takes it, and plain to one that does not', async () => {
    const server = await listenApp();
    try {
    for (const name of ['judge-sw.js', 'gate-sw.js', 'offline-shell-sw.js']) {
      const get = (encoding: string) => rawGet(`${server.baseUrl}/${name}`, { 'Accept-Encoding': encoding });
      const source = readFileSync(path.join(DIST, name));
      const br = await get('gzip, deflate, br');
      expect(br.status, name).toBe(200);
      expect(br.headers['content-encoding'], name).toBe('br');
      expect(br.headers['content-type'], name).toMatch(/javascript/);
      expect(br.headers['vary'], name).toMatch(/Accept-Encoding/i);
      expect(brotliDecompressSync(br.body).equals(source), name).toBe(true);

      const gz = await get('gzip');
      expect(gz.headers['content-encoding'], name).toBe('gzip');
      expect(gunzipSync(gz.body).equals(source), name).toBe(true);

      const plain = await get('identity');
      expect(plain.headers['content-encoding'], name).toBeUndefined();
      expect(plain.body.equals(source), name).toBe(true);
    }
    } finally {
      await server.close();
    }
  });
});
