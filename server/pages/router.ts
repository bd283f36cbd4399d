import { Router, type Request, type Response } from 'express';
import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import { brotliCompressSync, constants as zlib, gzipSync } from 'node:zlib';
import type { UnitSystem } from '@shared/calc';
import { loadPublicBuild, publicVersion } from '../services/public/public-builds';
import { presentPublicBuild } from '../presenters/public-build';
import { showSlotsOfBuild } from '../services/public/public-events';
import { loadPublicLogAndAnswers } from '../services/public/public-build-log';
import { presentBuildOverTime } from '../presenters/build-log';
import { NOT_FOUND_HTML, renderPublicBuildPage } from './public-build-page';
import { compressPage, publicPageCache, type CachedPage, type VoteSlot } from './page-cache';
import { encodingFor } from './send-html';
import { OSWALD_URL } from './page-styles';
import { config } from '../config';
import { isDatabaseUnavailable } from '../services/platform/database-unavailable';
import { votedNumber } from '../services/results/peoples-choice';
import { formTokenFor, readVoterCookie, voterOf } from './voter';
import { voteBoxMark, renderVoteBox, type VoteBoxState } from './vote-box';
import { EventSlugSchema } from '@shared/schemas/show';

/** Server-rendered public pages (/c/<code>): complete HTML, no app bundle, no session. */
export const pagesRouter = Router();

const require = createRequire(import.meta.url);
const OSWALD = readFileSync(require.resolve('@fontsource/oswald/files/oswald-latin-600-normal.woff2'));

pagesRouter.get(OSWALD_URL, (_req, res) => {
  res.type('font/woff2').set('Cache-Control', 'public, max-age=31536000, immutable').send(OSWALD);
});

const UNITS_COOKIE = 'placard-units';
const isUnitSystem = (v: unknown): v is UnitSystem => v === 'metric' || v === 'imperial' || v === 'uk';

/**
 * The units of the page: the visitor's pick (?units=, then remembered in a cookie for every build
 * they open), else their earlier pick (the cookie), else their language: US customary for US English
 * (and the two other countries that keep it), British usage for British English, metric otherwise.
 */
function unitsFor(req: Request, res: Response): { units: UnitSystem; chosen: boolean } {
  const q = req.query.units;
  if (isUnitSystem(q)) {
    if (req.cookies?.[UNITS_COOKIE] !== q) res.cookie(UNITS_COOKIE, q, { httpOnly: true, sameSite: 'lax', secure: config.secureCookies, path: '/c', maxAge: 365 * 86400_000 });
    return { units: q, chosen: true };
  }
  const remembered = req.cookies?.[UNITS_COOKIE];
  if (isUnitSystem(remembered)) return { units: remembered, chosen: false };
  const first = (req.get('accept-language') ?? '').split(',')[0]?.trim().toLowerCase() ?? '';
  if (first === 'en-gb') return { units: 'uk', chosen: false };
  return { units: first === 'en-us' || first.endsWith('-lr') || first.endsWith('-mm') ? 'imperial' : 'metric', chosen: false };
}

/** A page whose units come from the address varies by encoding only; otherwise by what decided them too. */
const varyOf = (decidedByHeaders: boolean) => (decidedByHeaders ? 'Accept-Encoding, Accept-Language, Cookie' : 'Accept-Encoding');

function notFound(res: Response) {
  res.status(404).type('html').set('Cache-Control', 'no-cache').send(NOT_FOUND_HTML);
}

function send(req: Request, res: Response, page: CachedPage, varyLanguage: boolean) {
  if (page.votes?.length) return sendWithVoteBoxes(req, res, page, page.votes, varyLanguage);
  res.set({
    ETag: page.etag,
    // On show day and in judging the vote button may appear or go at any moment: browsers check first (a cheap 304).
    // An answer that sets the units cookie is for this browser only.
    'Cache-Control': `${res.getHeader('set-cookie') ? 'private' : 'public'}, ${page.mustRevalidate ? 'no-cache' : 'max-age=30, stale-while-revalidate=300'}`,
    Vary: varyOf(varyLanguage),
  });
  // req.fresh compares If-None-Match with the ETag just set (weakly, as RFC 9110 asks for GET).
  if (req.fresh) {
    res.status(304).end();
    return;
  }
  const encoding = encodingFor(req);
  if (encoding !== 'identity') res.set('Content-Encoding', encoding);
  res.type('html').end(encoding === 'br' ? page.br : encoding === 'gzip' ? page.gzip : page.identity);
}

/**
 * While voting is open the shared cached page gets the visitor's own vote box (their form token, or
 * their thanks) on the way out, one per show taking votes, and the answer is private and never stored:
 * no one's state is cached.
 */
async function sendWithVoteBoxes(req: Request, res: Response, page: CachedPage, votes: VoteSlot[], varyLanguage: boolean) {
  const voter = voterOf(req, res);
  let text = page.identity.toString('utf8');
  for (const vote of votes) {
    let voted: number | null = null;
    try {
      voted = await votedNumber(vote.eventId, voter);
    } catch (err) {
      // The database is away: the page still shows, with the button (the vote itself will wait for it).
      if (!isDatabaseUnavailable(err)) throw err;
    }
    const box: VoteBoxState =
      voted === null ? { kind: 'open', anchor: vote.anchor, url: vote.url, formToken: formTokenFor(voter) } : { kind: 'voted', anchor: vote.anchor, thisCar: voted === vote.entryNumber, number: voted };
    text = text.replace(voteBoxMark(vote.eventId), renderVoteBox(box));
  }
  const html = Buffer.from(text, 'utf8');
  res.set({
    'Cache-Control': 'private, no-store',
    Vary: varyOf(varyLanguage),
    // Under the app-wide no-referrer a browser sends "Origin: null" with the form; same-origin lets the
    // vote carry its real Origin for the check, and still tells other sites nothing.
    'Referrer-Policy': 'same-origin',
  });
  const encoding = encodingFor(req);
  if (encoding !== 'identity') res.set('Content-Encoding', encoding);
  // Compressed per response at a quick level: a page is a few tens of kilobytes.
  res.type('html').end(encoding === 'br' ? brotliCompressSync(html, { params: { [zlib.BROTLI_PARAM_QUALITY]: 5 } }) : encoding === 'gzip' ? gzipSync(html, { level: 6 }) : html);
}

/** The show whose card's QR code was scanned (`?show=<slug>`): its entry leads the page. */
function showFirstOf(req: Request): string | undefined {
  const parsed = EventSlugSchema.safeParse(req.query.show);
  return parsed.success ? parsed.data : undefined;
}

pagesRouter.get('/c/:code', readVoterCookie, async (req, res) => {
  const code = String(req.params.code).toUpperCase();
  const { units, chosen } = unitsFor(req, res);
  const showFirst = showFirstOf(req);
  // The order of the shows is part of the page; the version (entries and shows included) keeps each order fresh.
  const key = showFirst ? `${code}|${units}|${showFirst}` : `${code}|${units}`;
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
    const shows = await showSlotsOfBuild(code, showFirst);
    const overTime = presentBuildOverTime(await loadPublicLogAndAnswers(build.id));
    const votes = shows.flatMap((s): VoteSlot[] => (s.vote ? [{ ...s.vote, anchor: `vote-${s.showSlug}`, entryNumber: Number(s.entryNumber) }] : []));
    const fresh: CachedPage = {
      ...compressPage(renderPublicBuildPage(presentPublicBuild(build), units, shows, null, overTime), version),
      checkedAt: Date.now(),
      ...(votes.length ? { votes } : {}),
      mustRevalidate: shows.some((s) => s.votingMayOpen),
    };
    publicPageCache.set(key, fresh);
    return fresh;
  });
  if (!page) return notFound(res);
  send(req, res, page, !chosen);
});
