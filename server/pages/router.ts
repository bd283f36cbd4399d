import { Router, type Request, type Response } from 'express';
import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import { brotliCompressSync, constants as zlib } from 'node:zlib';
import type { UnitSystem } from '@shared/calc';
import { loadPublicBuild, publicVersion } from '../services/public/public-builds';
import { presentPublicBuild } from '../presenters/public-build';
import { showSlotsOfBuild } from '../services/public/public-events';
import { loadPublicLogAndAnswers } from '../services/public/public-build-log';
import { presentBuildOverTime } from '../presenters/build-log';
import { NOT_FOUND_HTML, renderPublicBuildPage } from './public-build-page';
import type { CachedPage, VoteSlot } from './page-cache';
import { cachedPage, sendCached } from './cached-page';
import { gzipChunks, joinPlain, type PagePieces } from './page-pieces';
import { pageTags } from './page-dependencies';
import { encodingsAccepted } from './send-html';
import { OSWALD_URL } from './page-styles';
import { config } from '../config';
import { formTokenFor, readVoterCookie, voterOf, votesCast } from './voter';
import { voteBoxMark, renderVoteBox } from './vote-box';
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
  if (page.votes?.length && page.pieces) return sendWithVoteBoxes(req, res, page, page.votes, page.pieces, varyLanguage);
  sendCached(req, res, page, {
    // On show day and in judging the vote button may appear or go at any moment: browsers check first (a cheap 304).
    // An answer that sets the units cookie is for this browser only.
    cacheControl: `${res.getHeader('set-cookie') ? 'private' : 'public'}, ${page.mustRevalidate ? 'no-cache' : 'max-age=30, stale-while-revalidate=300'}`,
    vary: varyOf(varyLanguage),
  });
}

const TOKEN_HOLE = '__visitor_form_token__';
const openBoxes = new WeakMap<VoteSlot, string>();
const votedBoxes = new Map<string, string>();

/** The open box of a slot, rendered once with a hole for the visitor's form token. */
function openBox(slot: VoteSlot, formToken: string): string {
  let html = openBoxes.get(slot);
  if (html === undefined) openBoxes.set(slot, (html = renderVoteBox({ kind: 'open', anchor: slot.anchor, url: slot.url, formToken: TOKEN_HOLE })));
  return html.replace(TOKEN_HOLE, formToken);
}

/** The thanks box, rendered once per anchor and vote (a few per show). */
function votedBox(slot: VoteSlot, number: number): string {
  const key = `${slot.anchor}|${number}|${number === slot.entryNumber}`;
  let html = votedBoxes.get(key);
  if (html === undefined) {
    if (votedBoxes.size > 5000) votedBoxes.clear();
    votedBoxes.set(key, (html = renderVoteBox({ kind: 'voted', anchor: slot.anchor, thisCar: number === slot.entryNumber, number })));
  }
  return html;
}

/**
 * While voting is open the shared cached page gets the visitor's own vote box (their form token, or
 * their thanks, read from their signed cookies) in each hole on the way out: no query, no page render
 * and no recompression per response. The answer is private and never stored: no one's state is cached.
 */
function sendWithVoteBoxes(req: Request, res: Response, page: CachedPage, votes: VoteSlot[], pieces: PagePieces, varyLanguage: boolean) {
  const voter = voterOf(req, res);
  const cast = votesCast(req);
  const boxes = new Map(
    votes.map((slot) => {
      const voted = cast.get(slot.eventId);
      return [voteBoxMark(slot.eventId), voted === undefined ? openBox(slot, formTokenFor(voter)) : votedBox(slot, voted)] as const;
    }),
  );
  const fill = (mark: string) => boxes.get(mark) ?? '';
  res.set({
    'Cache-Control': 'private, no-store',
    Vary: varyOf(varyLanguage),
    // Under the app-wide no-referrer a browser sends "Origin: null" with the form; same-origin lets the
    // vote carry its real Origin for the check, and still tells other sites nothing.
    'Referrer-Policy': 'same-origin',
  });
  const takes = encodingsAccepted(req);
  res.type('html');
  // gzip joins the page's parts compressed once with the boxes; a browser that takes only brotli gets it made now.
  if (takes.gzip) {
    const { chunks, length } = gzipChunks(pieces, fill);
    res.set({ 'Content-Encoding': 'gzip', 'Content-Length': String(length) });
    res.cork(); // one write to the socket, without joining the page into a new buffer first
    for (const chunk of chunks) res.write(chunk);
    return void res.end();
  }
  const html = joinPlain(pieces, fill);
  if (takes.br) return void res.set('Content-Encoding', 'br').end(brotliCompressSync(html, { params: { [zlib.BROTLI_PARAM_QUALITY]: 5 } }));
  res.end(html);
}

/** The show whose card's QR code was scanned (`?show=<slug>`): its entry leads the page. */
function showFirstOf(req: Request): string | undefined {
  if (req.query.show === undefined) return undefined; // most visits: no failed parse (and its error object) per request
  const parsed = EventSlugSchema.safeParse(req.query.show);
  return parsed.success ? parsed.data : undefined;
}

pagesRouter.get('/c/:code', readVoterCookie, async (req, res) => {
  const code = String(req.params.code).toUpperCase();
  const { units, chosen } = unitsFor(req, res);
  const showFirst = showFirstOf(req);
  // The order of the shows is part of the page; the tags (entries and shows included) keep each order fresh.
  const key = showFirst ? `${code}|${units}|${showFirst}` : `${code}|${units}`;
  const page = await cachedPage(req, key, {
    version: () => publicVersion(code),
    render: async () => {
      const version = await publicVersion(code);
      const build = version ? await loadPublicBuild(code) : null;
      if (!version || !build) return null;
      const shows = await showSlotsOfBuild(code, showFirst);
      const overTime = presentBuildOverTime(await loadPublicLogAndAnswers(build.id));
      return {
        html: renderPublicBuildPage(presentPublicBuild(build), units, shows, null, overTime),
        tags: pageTags.build(build.id, build.ownerId, shows.map((s) => s.eventId)),
        version,
        votes: shows.flatMap((s): VoteSlot[] => (s.vote ? [{ ...s.vote, anchor: `vote-${s.showSlug}`, entryNumber: Number(s.entryNumber) }] : [])),
        mustRevalidate: shows.some((s) => s.votingMayOpen),
      };
    },
  });
  if (!page) return notFound(res);
  send(req, res, page, !chosen);
});
