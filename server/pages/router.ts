import { Router, type Request, type Response } from 'express';
import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import type { UnitSystem } from '@shared/calc';
import { loadPublicBuild, publicVersion } from '../services/public-builds';
import { NOT_FOUND_HTML, renderPublicBuildPage } from './public-build-page';
import { compressPage, matchesEtag, pickEncoding, publicPageCache, type CachedPage } from './page-cache';
import { OSWALD_URL } from './page-styles';
import { isDatabaseUnavailable } from '../db/unavailable';

/** Server-rendered public pages (/c/<code>): complete HTML, no app bundle, no session. */
export const pagesRouter = Router();

const require = createRequire(import.meta.url);
const OSWALD = readFileSync(require.resolve('@fontsource/oswald/files/oswald-latin-600-normal.woff2'));

pagesRouter.get(OSWALD_URL, (_req, res) => {
  res.type('font/woff2').set('Cache-Control', 'public, max-age=31536000, immutable').send(OSWALD);
});

/** Imperial for US English, metric otherwise, unless the visitor picked with ?units=. */
function unitsFor(req: Request): { units: UnitSystem; chosen: boolean } {
  const q = req.query.units;
  if (q === 'metric' || q === 'imperial') return { units: q, chosen: true };
  const first = (req.get('accept-language') ?? '').split(',')[0]?.trim().toLowerCase() ?? '';
  return { units: first === 'en-us' || first.endsWith('-lr') || first.endsWith('-mm') ? 'imperial' : 'metric', chosen: false };
}

function notFound(res: Response) {
  res.status(404).type('html').set('Cache-Control', 'no-cache').send(NOT_FOUND_HTML);
}

function send(req: Request, res: Response, page: CachedPage, varyLanguage: boolean) {
  res.set({
    ETag: page.etag,
    'Cache-Control': 'public, max-age=30, stale-while-revalidate=300',
    Vary: varyLanguage ? 'Accept-Encoding, Accept-Language' : 'Accept-Encoding',
  });
  if (matchesEtag(req.get('if-none-match'), page.etag)) {
    res.status(304).end();
    return;
  }
  const encoding = pickEncoding(req.get('accept-encoding'));
  if (encoding !== 'identity') res.set('Content-Encoding', encoding);
  res.type('html').end(encoding === 'br' ? page.br : encoding === 'gzip' ? page.gzip : page.identity);
}

pagesRouter.get('/c/:code', async (req, res) => {
  const code = String(req.params.code).toUpperCase();
  const { units, chosen } = unitsFor(req);
  const key = `${code}|${units}`;
  const cached = publicPageCache.get(key);
  const now = Date.now();
  if (cached && now - cached.checkedAt < publicPageCache.revalidateAfterMs) return send(req, res, cached, !chosen);

  let version: string | null;
  try {
    version = await publicVersion(code);
  } catch (err) {
    // The database is away: a page we already rendered is still the build as last published.
    if (!cached || !isDatabaseUnavailable(err)) throw err;
    req.log.warn({ err }, 'database unavailable: public page served from the cache');
    return send(req, res, cached, !chosen);
  }
  if (!version) {
    publicPageCache.delete(key);
    return notFound(res);
  }
  if (cached && cached.version === version) {
    cached.checkedAt = now;
    return send(req, res, cached, !chosen);
  }
  const page = await publicPageCache.once(`${key}|${version}`, async () => {
    const build = await loadPublicBuild(code);
    if (!build) return null;
    const fresh = { ...compressPage(renderPublicBuildPage(build, units), version), checkedAt: Date.now() };
    publicPageCache.set(key, fresh);
    return fresh;
  });
  if (!page) return notFound(res);
  send(req, res, page, !chosen);
});
