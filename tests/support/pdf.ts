import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { PNG } from 'pngjs';
import jsQR from 'jsqr';
import { extractText, getDocumentProxy } from 'unpdf';

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

/** Decodes a QR code in RGBA pixels; null when none reads. */
export function readQr(img: { width: number; height: number; data: Buffer | Uint8ClampedArray }) {
  return jsQR(new Uint8ClampedArray(img.data.buffer, img.data.byteOffset, img.data.byteLength), img.width, img.height);
}

export function readQrPng(png: Buffer) {
  const img = PNG.sync.read(png);
  return readQr(img);
}
