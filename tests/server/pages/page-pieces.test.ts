import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { crc32, gunzipSync, inflateRawSync } from 'node:zlib';
import { crc32Combine, gzipChunks, joinPlain, piecesOf, storedBlocks } from '@server/pages/page-pieces';

// A page with holes, filled per visitor: what the browser inflates must be exactly the page with its
// pieces in place. Node's own gunzip (zlib) is the reference decoder.
describe('a cached page joined with a visitor’s pieces', () => {
  it('inflates to the plain page for any page, marks and pieces, long pieces included', () => {
    const text = fc.string({ unit: 'binary', maxLength: 400 });
    fc.assert(
      fc.property(fc.array(text, { minLength: 1, maxLength: 4 }), fc.array(fc.oneof(text, fc.constant('x'.repeat(70_000))), { minLength: 3, maxLength: 3 }), (between, fills) => {
        const marks = ['<!--hole-a-->', '<!--hole-b-->', '<!--hole-c-->'];
        const html = between.map((part, i) => part + (i < between.length - 1 ? marks[i % 3] : '')).join('');
        const pieces = piecesOf(html, marks);
        const fill = (mark: string) => fills[marks.indexOf(mark)]!;
        const plain = joinPlain(pieces, fill);
        expect(gunzipSync(Buffer.concat(gzipChunks(pieces, fill).chunks)).equals(plain)).toBe(true);
        expect(plain.toString('utf8')).toBe(html.replace(/<!--hole-([abc])-->/g, (_, k: string) => fills['abc'.indexOf(k)]!));
      }),
      { numRuns: 60 },
    );
  });

  it('writes a piece as stored blocks of at most 65,535 bytes that a decoder reads back as they are', () => {
    const piece = Buffer.from('é'.repeat(40_000)); // 80,000 bytes: two blocks
    const blocks = storedBlocks(piece);
    expect(blocks.filter((_, i) => i % 2 === 1).map((b) => b.length)).toEqual([65_535, 14_465]);
    // A final empty stored block (header 0x01) ends the stream for the check.
    const stream = Buffer.concat([...blocks, Buffer.from([1, 0, 0, 0xff, 0xff])]);
    expect(inflateRawSync(stream).equals(piece)).toBe(true);
    expect(storedBlocks(Buffer.alloc(0))).toEqual([]);
  });
});

describe('CRC-32 of joined bytes from the parts’ own CRCs', () => {
  it('equals zlib’s CRC-32 of the joined bytes, empty parts and long ones included', () => {
    const bytes = fc.oneof(fc.uint8Array({ maxLength: 300 }), fc.constant(new Uint8Array(70_000).fill(7)));
    fc.assert(
      fc.property(bytes, bytes, (a, b) => {
        const [x, y] = [Buffer.from(a), Buffer.from(b)];
        const crcOf = (buf: Buffer) => (buf.length ? crc32(buf) : 0);
        expect(crc32Combine(crcOf(x), crcOf(y), y.length)).toBe(crcOf(Buffer.concat([x, y])));
      }),
      { numRuns: 200 },
    );
    // CRC-32/ISO-HDLC's check value, "123456789" → CBF43926 (the CRC catalogue's, from memory), joined from "1234" and "56789".
    expect(crc32Combine(crc32('1234'), crc32('56789'), 5).toString(16)).toBe('cbf43926');
  });
});
