import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { PNG } from 'pngjs';
import jsQR from 'jsqr';
import { extractText, getDocumentProxy, getResolvedPDFJS } from 'unpdf';
import { FACES, type Face } from '@templates/cards/fonts';
import { fontOf } from '@templates/cards/measure';

/** Every page's MediaBox as [x0, y0, x1, y1] points, read from the PDF's own page objects. */
export function mediaBoxes(pdf: Buffer): number[][] {
  const text = pdf.toString('latin1');
  return [...text.matchAll(/\/Type \/Page\b[^]*?\/MediaBox \[([^\]]+)\]/g)].map((m) => m[1]!.trim().split(/\s+/).map(Number));
}

/** Pages counted from the page tree's own /Count, and from the page objects themselves. */
export function pageCount(pdf: Buffer): { tree: number; objects: number } {
  const text = pdf.toString('latin1');
  const tree = Number(text.match(/\/Type \/Pages[^]*?\/Count (\d+)/)?.[1] ?? NaN);
  const objects = (text.match(/\/Type \/Page\b(?!s)/g) ?? []).length;
  return { tree, objects };
}

/** All the text a reader could copy out of the PDF. */
export async function pdfText(pdf: Buffer): Promise<string> {
  const doc = await getDocumentProxy(new Uint8Array(pdf));
  const { text } = await extractText(doc, { mergePages: true });
  return text;
}

export const PDFTOPPM = '/usr/bin/pdftoppm';
// npm test installs poppler-utils when pdftoppm is missing (tests/support/run-all.ts).

/** The first page as RGBA pixels at `dpi` (needs poppler's pdftoppm). */
export function rasterize(pdf: Buffer, dpi: number): { width: number; height: number; data: Buffer } {
  const dir = mkdtempSync(path.join(tmpdir(), 'placard-pdf-'));
  try {
    writeFileSync(path.join(dir, 'card.pdf'), pdf);
    execFileSync(PDFTOPPM, ['-r', String(dpi), '-png', '-singlefile', path.join(dir, 'card.pdf'), path.join(dir, 'page')]);
    const png = PNG.sync.read(readFileSync(path.join(dir, 'page.png')));
    return { width: png.width, height: png.height, data: png.data };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

export type Pixels = { width: number; height: number; data: Buffer };

/** Every page as RGBA pixels at `dpi`, from one pdftoppm run (cheap at scanning resolutions). */
export function rasterizePages(pdf: Buffer, dpi: number): Pixels[] {
  const dir = mkdtempSync(path.join(tmpdir(), 'placard-pdf-'));
  try {
    writeFileSync(path.join(dir, 'doc.pdf'), pdf);
    execFileSync(PDFTOPPM, ['-r', String(dpi), '-png', path.join(dir, 'doc.pdf'), path.join(dir, 'page')]);
    // pdftoppm numbers the files page-01.png … with as many digits as the last page needs.
    const files = readdirSync(dir).filter((f) => f.startsWith('page-')).sort((a, b) => Number(a.match(/\d+/)![0]) - Number(b.match(/\d+/)![0]));
    return files.map((f) => PNG.sync.read(readFileSync(path.join(dir, f))));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/**
 * The part of a page a phone aimed at the code would see: `box` (PDF points, origin bottom left)
 * grown by `aroundPt` on every side, cut out of pixels rendered at `dpi`.
 */
export function cropPoints(img: Pixels, box: Box, dpi: number, aroundPt: number): Pixels {
  const s = dpi / 72;
  const x0 = Math.max(0, Math.floor((box.x0 - aroundPt) * s));
  const x1 = Math.min(img.width, Math.ceil((box.x1 + aroundPt) * s));
  const y0 = Math.max(0, Math.floor(img.height - (box.y1 + aroundPt) * s));
  const y1 = Math.min(img.height, Math.ceil(img.height - (box.y0 - aroundPt) * s));
  const width = x1 - x0;
  const data = Buffer.alloc(width * (y1 - y0) * 4);
  for (let y = y0; y < y1; y++) img.data.copy(data, (y - y0) * width * 4, (y * img.width + x0) * 4, (y * img.width + x1) * 4);
  return { width, height: y1 - y0, data };
}

/** Decodes a QR code in RGBA pixels; null when none reads. */
export function readQr(img: { width: number; height: number; data: Buffer | Uint8ClampedArray }) {
  return jsQR(new Uint8ClampedArray(img.data.buffer, img.data.byteOffset, img.data.byteLength), img.width, img.height);
}

export function readQrPng(png: Buffer) {
  const img = PNG.sync.read(png);
  return readQr(img);
}

// ---------------------------------------------------------------------------------------------
// Reading a card's layout back: every text item's box, the photo and the QR code, in PDF points.

// pdf.js calls ArrayBuffer.prototype.transferToFixedLength, which Node 20 lacks; a copy does the same here.
const abProto = ArrayBuffer.prototype as unknown as { transferToFixedLength?: (n?: number) => ArrayBuffer };
abProto.transferToFixedLength ??= function (this: ArrayBuffer, n = this.byteLength) {
  const copy = new ArrayBuffer(n);
  new Uint8Array(copy).set(new Uint8Array(this, 0, Math.min(n, this.byteLength)));
  return copy;
};

export type Box = { x0: number; y0: number; x1: number; y1: number };
export type TextBox = Box & { str: string; size: number; face: Face | null };
export type CardLayout = { mediaBox: number[]; pages: number; texts: TextBox[]; images: Box[]; qr: (Box & { ops: number }) | null };

const faceByPostscript = new Map(Object.keys(FACES).map((face) => [fontOf(face as Face).postscriptName, face as Face]));

/**
 * The boxes on page 1. A text box runs from the item's start to its advance width across, and from
 * the lowest to the highest ink of its glyphs up and down (measured with fontkit on the same font
 * files, so a tight line of capitals is not mistaken for an overlap).
 */
export async function readCardLayout(pdf: Buffer): Promise<CardLayout> {
  return (await readCardLayouts(pdf))[0]!;
}

/** Every page's boxes, reading the document once (its fonts are parsed once for all pages). */
export async function readCardLayouts(pdf: Buffer): Promise<CardLayout[]> {
  const doc = await getDocumentProxy(new Uint8Array(pdf));
  const out: CardLayout[] = [];
  for (let n = 1; n <= doc.numPages; n++) out.push(await readPage(await doc.getPage(n), doc.numPages));
  await doc.cleanup();
  return out;
}

type PdfPage = Awaited<ReturnType<Awaited<ReturnType<typeof getDocumentProxy>>['getPage']>>;
async function readPage(page: PdfPage, pages: number): Promise<CardLayout> {
  const { OPS } = await getResolvedPDFJS();
  const ops = await page.getOperatorList();
  const images: Box[] = [];
  let qr: CardLayout['qr'] = null;
  type M = [number, number, number, number, number, number];
  const mul = (m: M, n: M): M => [m[0] * n[0] + m[2] * n[1], m[1] * n[0] + m[3] * n[1], m[0] * n[2] + m[2] * n[3], m[1] * n[2] + m[3] * n[3], m[0] * n[4] + m[2] * n[5] + m[4], m[1] * n[4] + m[3] * n[5] + m[5]];
  const apply = (m: M, x: number, y: number) => [m[0] * x + m[2] * y + m[4], m[1] * x + m[3] * y + m[5]] as const;
  const boxOf = (m: M, x0: number, y0: number, x1: number, y1: number): Box => {
    const pts = [apply(m, x0, y0), apply(m, x1, y0), apply(m, x0, y1), apply(m, x1, y1)];
    return { x0: Math.min(...pts.map((p) => p[0])), y0: Math.min(...pts.map((p) => p[1])), x1: Math.max(...pts.map((p) => p[0])), y1: Math.max(...pts.map((p) => p[1])) };
  };
  const everything: Box = { x0: -Infinity, y0: -Infinity, x1: Infinity, y1: Infinity };
  const intersect = (a: Box, b: Box): Box => ({ x0: Math.max(a.x0, b.x0), y0: Math.max(a.y0, b.y0), x1: Math.min(a.x1, b.x1), y1: Math.min(a.y1, b.y1) });
  let ctm: M = [1, 0, 0, 1, 0, 0];
  let clip = everything;
  let lastPath: Box | null = null;
  const stack: Array<{ ctm: M; clip: Box }> = [];
  ops.fnArray.forEach((fn, i) => {
    const args = ops.argsArray[i] as unknown[];
    if (fn === OPS.save) stack.push({ ctm, clip });
    else if (fn === OPS.restore) ({ ctm, clip } = stack.pop() ?? { ctm, clip });
    else if (fn === OPS.transform) ctm = mul(ctm, args as M);
    // A photo drawn to cover its box is painted whole and clipped: what shows is the clipped part.
    else if (fn === OPS.clip || fn === OPS.eoClip) clip = lastPath ? intersect(clip, lastPath) : clip;
    else if (fn === OPS.paintImageXObject) images.push(intersect(boxOf(ctm, 0, 0, 1, 1), clip));
    else if (fn === OPS.constructPath) {
      const data = (args[1] as ArrayLike<number>[] | undefined)?.[0];
      const minMax = args[2] as ArrayLike<number> | undefined;
      if (!minMax) return;
      lastPath = boxOf(ctm, minMax[0]!, minMax[1]!, minMax[2]!, minMax[3]!);
      // The QR code is the one path of hundreds of little squares.
      if (data && data.length > 1000 && (!qr || data.length > qr.ops)) qr = { ...lastPath, ops: data.length };
    }
  });
  const content = await page.getTextContent();
  const texts: TextBox[] = [];
  for (const item of content.items) {
    if (!('str' in item) || !item.str.trim()) continue;
    const [a, b, , , x, y] = item.transform as number[];
    const size = Math.hypot(a!, b!);
    const fontName = (page.commonObjs.get(item.fontName) as { name?: string } | undefined)?.name ?? '';
    const face = faceByPostscript.get(fontName.replace(/^[A-Z]{6}\+/, '')) ?? null;
    let lo = -0.25;
    let hi = 0.85;
    if (face) {
      const font = fontOf(face);
      const run = font.layout(item.str.replace(/\s+/g, ''));
      const glyphs = run.glyphs.filter((g) => g.bbox.maxY > g.bbox.minY);
      if (glyphs.length) {
        lo = Math.min(...glyphs.map((g) => g.bbox.minY)) / font.unitsPerEm;
        hi = Math.max(...glyphs.map((g) => g.bbox.maxY)) / font.unitsPerEm;
      }
    }
    texts.push({ str: item.str, size, face, x0: x!, x1: x! + item.width, y0: y! + lo * size, y1: y! + hi * size });
  }
  return { mediaBox: [...page.view], pages, texts, images, qr };
}

export const overlaps = (a: Box, b: Box, tolerance = 0) => a.x0 < b.x1 - tolerance && b.x0 < a.x1 - tolerance && a.y0 < b.y1 - tolerance && b.y0 < a.y1 - tolerance;
export const inside = (a: Box, outer: Box, tolerance = 0) => a.x0 >= outer.x0 - tolerance && a.y0 >= outer.y0 - tolerance && a.x1 <= outer.x1 + tolerance && a.y1 <= outer.y1 + tolerance;
