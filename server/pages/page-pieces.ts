import { constants as zlib, crc32, deflateRawSync } from 'node:zlib';

/**
 * A cached page with holes for each visitor's own piece (their vote box). Its fixed parts are
 * compressed once, each as raw DEFLATE flushed to a byte boundary, so a response is the parts with
 * the visitor's small pieces between them as stored (uncompressed) DEFLATE blocks, in one gzip member:
 * no render, no compressor and no recompression of the page per response. (Brotli streams do not join
 * this way: such pages go out in gzip to browsers that take it.)
 */
export type PagePieces = { parts: Buffer[]; deflated: Buffer[]; holes: string[] };

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
  return { parts, holes, deflated: parts.map((p) => flushed(p, 9)) };
}

/** The page with `fill(mark)` in each hole, uncompressed. */
export function joinPlain(p: PagePieces, fill: (mark: string) => string): Buffer {
  const out: Buffer[] = [p.parts[0]!];
  p.holes.forEach((mark, i) => out.push(Buffer.from(fill(mark), 'utf8'), p.parts[i + 1]!));
  return Buffer.concat(out);
}

/** CRC-32 carried over `bytes`; Node 20's crc32 answers 0 for an empty buffer with no memory behind it, whatever it carried. */
const crcOver = (bytes: Buffer, crc: number) => (bytes.length ? crc32(bytes, crc) : crc);

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

/** The same page as one gzip member: the fixed parts as compressed once, each filled hole as stored blocks. */
export function joinGzip(p: PagePieces, fill: (mark: string) => string): Buffer {
  const out: Buffer[] = [GZIP_HEADER, p.deflated[0]!];
  let crc = crc32(p.parts[0]!);
  let size = p.parts[0]!.length;
  p.holes.forEach((mark, i) => {
    const piece = Buffer.from(fill(mark), 'utf8');
    const part = p.parts[i + 1]!;
    out.push(...storedBlocks(piece), p.deflated[i + 1]!);
    crc = crcOver(part, crcOver(piece, crc));
    size += piece.length + part.length;
  });
  const trailer = Buffer.alloc(8);
  trailer.writeUInt32LE(crc >>> 0, 0);
  trailer.writeUInt32LE(size >>> 0, 4);
  out.push(FINAL_BLOCK, trailer);
  return Buffer.concat(out);
}
