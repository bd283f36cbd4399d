import { constants as zlib, crc32, deflateRawSync } from 'node:zlib';

/**
 * A cached page with holes for each visitor's own piece (their vote box). Its fixed parts are
 * compressed once, each as raw DEFLATE flushed to a byte boundary, so a response is the parts with
 * the visitor's small pieces between them as stored (uncompressed) DEFLATE blocks, in one gzip member:
 * no render, no compressor and no recompression of the page per response. (Brotli streams do not join
 * this way: such pages go out in gzip to browsers that take it.)
 */
export type PagePieces = { parts: Buffer[]; deflated: Buffer[]; holes: string[]; /** CRC-32 of each part, for joining without reading the page again. */ crcs: number[] };

const GZIP_HEADER = Buffer.from([0x1f, 0x8b, 8, 0, 0, 0, 0, 0, 0, 0xff]);
const FINAL_BLOCK = deflateRawSync(Buffer.alloc(0));
const flushed = (b: Buffer, level: number) => deflateRawSync(b, { level, finishFlush: zlib.Z_FULL_FLUSH });

/** Splits `html` at each of `marks` (kept in `holes`, in page order) and compresses the parts between. */
export function piecesOf(html: string, marks: string[]): PagePieces {
  const parts: Buffer[] = [];
  const holes: string[] = [];
  let rest = html;
  for (;;) {
    const next = marks.map((m) => ({ m, at: rest.indexOf(m) })).filter((x) => x.at >= 0).sort((a, b) => a.at - b.at)[0];
    if (!next) break;
    parts.push(Buffer.from(rest.slice(0, next.at), 'utf8'));
    holes.push(next.m);
    rest = rest.slice(next.at + next.m.length);
  }
  parts.push(Buffer.from(rest, 'utf8'));
  return { parts, holes, deflated: parts.map((p) => flushed(p, 9)), crcs: parts.map((p) => (p.length ? crc32(p) : 0)) };
}

/** The page with `fill(mark)` in each hole, uncompressed. */
export function joinPlain(p: PagePieces, fill: (mark: string) => string): Buffer {
  const out: Buffer[] = [p.parts[0]!];
  p.holes.forEach((mark, i) => out.push(Buffer.from(fill(mark), 'utf8'), p.parts[i + 1]!));
  return Buffer.concat(out);
}

/*
 * CRC-32 of two strings joined, from their own CRCs and the second's length, as zlib's crc32_combine does
 * (polynomial arithmetic modulo the CRC's generator, reflected: multiply by x^(8 × length)). Written from
 * memory of zlib's crc32.c; checked against Node's own crc32 of the joined bytes in page-pieces.test.ts.
 */
const POLY = 0xedb88320;
function multModP(a: number, b: number): number {
  let m = 0x80000000;
  let p = 0;
  for (;;) {
    if (a & m) {
      p ^= b;
      if ((a & (m - 1)) === 0) break;
    }
    m >>>= 1;
    b = b & 1 ? (b >>> 1) ^ POLY : b >>> 1;
  }
  return p >>> 0;
}
/** x^(2^k) modulo the generator, k = 0…31. */
const X2N = (() => {
  const table = [0x40000000];
  for (let k = 1; k < 32; k++) table.push(multModP(table[k - 1]!, table[k - 1]!));
  return table;
})();
function x2nModP(n: number, k: number): number {
  let p = 0x80000000; // x^0
  for (; n; n = Math.floor(n / 2), k++) if (n % 2) p = multModP(X2N[k & 31]!, p);
  return p;
}
export const crc32Combine = (crc1: number, crc2: number, length2: number) => (multModP(x2nModP(length2, 3), crc1) ^ crc2) >>> 0;

/** Most bytes one stored block holds: its length is a 16-bit field (RFC 1951, 3.2.4). */
const STORED_MAX = 0xffff;

/**
 * `bytes` as stored DEFLATE blocks, for a stream at a byte boundary (RFC 1951, 3.2.4): each block is a
 * header byte with BFINAL 0 and BTYPE 00 (padded to the byte), LEN and its one's complement NLEN as
 * little-endian 16-bit numbers, then LEN bytes as they are. A visitor's piece is a few hundred bytes,
 * so compressing it saves nothing worth a compressor per response.
 */
export function storedBlocks(bytes: Buffer): Buffer[] {
  const out: Buffer[] = [];
  for (let at = 0; at < bytes.length; at += STORED_MAX) {
    const chunk = bytes.subarray(at, at + STORED_MAX);
    const head = Buffer.alloc(5);
    head.writeUInt16LE(chunk.length, 1);
    head.writeUInt16LE(~chunk.length & 0xffff, 3);
    out.push(head, chunk);
  }
  return out;
}

/**
 * The same page as one gzip member, in the chunks to write one after another (no copy of the page per
 * response): the fixed parts as compressed once, each filled hole as stored blocks.
 */
export function gzipChunks(p: PagePieces, fill: (mark: string) => string): { chunks: Buffer[]; length: number } {
  const out: Buffer[] = [GZIP_HEADER, p.deflated[0]!];
  let crc = p.crcs[0]!;
  let size = p.parts[0]!.length;
  p.holes.forEach((mark, i) => {
    const piece = Buffer.from(fill(mark), 'utf8');
    const part = p.parts[i + 1]!;
    out.push(...storedBlocks(piece), p.deflated[i + 1]!);
    // Only the visitor's piece is read now; the page's parts bring their CRCs from the cache.
    crc = crc32Combine(crc32Combine(crc, piece.length ? crc32(piece) : 0, piece.length), p.crcs[i + 1]!, part.length);
    size += piece.length + part.length;
  });
  const trailer = Buffer.alloc(8);
  trailer.writeUInt32LE(crc >>> 0, 0);
  trailer.writeUInt32LE(size >>> 0, 4);
  out.push(FINAL_BLOCK, trailer);
  return { chunks: out, length: out.reduce((n, b) => n + b.length, 0) };
}
