import { renderToStaticMarkup } from 'react-dom/server';
import type { PublicLogPost } from '@shared/schemas/build-log';
import { LightText } from './build-log-sections';

/** The five characters XML gives meaning to, written as references. */
export const escapeXml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' })[c]!);

export type FeedInput = { buildUrl: string; title: string; ownerName: string; buildUpdatedAt: string; posts: PublicLogPost[] };

const absolute = (base: string, url: string) => (/^https?:/.test(url) ? url : `${new URL(base).origin}${url}`);

/** A post as HTML for feed readers: the same light formatting as the page, photos at a phone's size. */
function entryHtml(post: PublicLogPost, base: string): string {
  return renderToStaticMarkup(
    <>
      <LightText text={post.body} />
      {post.photos.map((p) => {
        const src = p.sources.find((s) => s.width >= 960) ?? p.sources[p.sources.length - 1];
        return src ? <img key={p.id} src={absolute(base, src.jpeg)} width={src.width} height={src.height} alt={p.caption || post.title} /> : null;
      })}
    </>,
  );
}

/**
 * The build log as an Atom 1.0 feed (RFC 4287), written here rather than with a feed package: the
 * format needs a handful of elements, each escaped by `escapeXml`; the test reads it back with an XML parser.
 */
export function buildLogFeed(input: FeedInput): string {
  const logUrl = `${input.buildUrl}/log`;
  const updated = input.posts.reduce((newest, p) => (p.updatedAt > newest ? p.updatedAt : newest), input.buildUpdatedAt);
  const entries = input.posts.map((p) => {
    const url = `${logUrl}#post-${p.id}`;
    return [
      '<entry>',
      `<id>${escapeXml(url)}</id>`,
      `<title>${escapeXml(p.title)}</title>`,
      `<link rel="alternate" type="text/html" href="${escapeXml(url)}"/>`,
      `<published>${p.postedOn}T00:00:00Z</published>`,
      `<updated>${p.updatedAt}</updated>`,
      `<content type="html">${escapeXml(entryHtml(p, input.buildUrl))}</content>`,
      '</entry>',
    ].join('');
  });
  return [
    '<?xml version="1.0" encoding="utf-8"?>',
    '<feed xmlns="http://www.w3.org/2005/Atom">',
    `<id>${escapeXml(logUrl)}</id>`,
    `<title>${escapeXml(`${input.title}: build log`)}</title>`,
    `<updated>${updated}</updated>`,
    `<author><name>${escapeXml(input.ownerName || 'The owner')}</name></author>`,
    `<link rel="self" type="application/atom+xml" href="${escapeXml(`${logUrl}.atom`)}"/>`,
    `<link rel="alternate" type="text/html" href="${escapeXml(logUrl)}"/>`,
    '<generator>Placard</generator>',
    ...entries,
    '</feed>',
  ].join('\n');
}
