import sharp, { type Metadata } from 'sharp';
import { PHOTO_WIDTHS } from '@shared/schemas/build';

/** The formats we accept, recognised by their first bytes, never by the name or the browser's word. */
export type ImageKind = 'jpeg' | 'png' | 'webp' | 'avif';
export const ACCEPTED_KINDS_TEXT = 'JPEG, PNG, WebP or AVIF';

// A decompression bomb is small on the wire and huge in memory: refuse it before decoding.
export const MAX_INPUT_PIXELS = 100_000_000;

// libvips gives each image one thread per core by default; one thread per image leaves the other
// core to the event loop (visitors), and imageSlots in image-budget.ts bounds how many run at once.
sharp.concurrency(1);

const ascii = (bytes: Buffer, start: number, end: number) => bytes.subarray(start, end).toString('latin1');

/** Reads the ISO-BMFF `ftyp` box (AVIF, HEIC) and returns its major and compatible brands. */
function ftypBrands(bytes: Buffer): string[] {
  if (bytes.length < 16 || ascii(bytes, 4, 8) !== 'ftyp') return [];
  const size = Math.min(bytes.readUInt32BE(0), bytes.length, 256);
  const brands = [ascii(bytes, 8, 12)];
  for (let at = 16; at + 4 <= size; at += 4) brands.push(ascii(bytes, at, at + 4));
  return brands;
}

/** What the bytes say the file is: one of ours, 'heic' (recognised, not decodable here) or null. */
export function sniffImage(bytes: Buffer): ImageKind | 'heic' | null {
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return 'jpeg';
  if (bytes.length >= 8 && bytes.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return 'png';
  if (bytes.length >= 12 && ascii(bytes, 0, 4) === 'RIFF' && ascii(bytes, 8, 12) === 'WEBP') return 'webp';
  const brands = ftypBrands(bytes);
  if (brands.some((b) => b === 'avif' || b === 'avis')) return 'avif';
  if (brands.some((b) => ['heic', 'heix', 'heim', 'heis', 'hevc', 'hevx', 'mif1', 'msf1'].includes(b))) return 'heic';
  return null;
}

/** The widths to store: the standard ones the original can fill, or the original's own width when it is narrower than all. */
export function variantWidths(originalWidth: number): number[] {
  const fitting = PHOTO_WIDTHS.filter((w) => w <= originalWidth);
  return fitting.length > 0 ? fitting : [originalWidth];
}

export type ProcessedVariant = { width: number; height: number; webp: Buffer; jpeg: Buffer };
export type ProcessedImage = { kind: ImageKind; width: number; height: number; variants: ProcessedVariant[] };

/** Decoded pixels of an image from its header alone (cheap); 0 when the header cannot be read (processImage then says why). */
export async function imagePixels(bytes: Buffer): Promise<number> {
  try {
    const meta = await sharp(bytes, { limitInputPixels: false }).metadata();
    return (meta.width ?? 0) * (meta.height ?? 0);
  } catch {
    return 0;
  }
}

/** Thrown with a sentence for the uploader when the bytes are not a photo we can use. */
export class ImageRejectedError extends Error {}

// sharp's decoder name for each kind (AVIF is decoded by libheif).
const DECODER: Record<ImageKind, string> = { jpeg: 'jpeg', png: 'png', webp: 'webp', avif: 'heif' };

/**
 * Checks the bytes, then re-encodes the photo in each width as WebP and JPEG: turned upright by
 * its EXIF orientation, converted to sRGB, with every piece of metadata (EXIF, GPS, XMP, ICC) left out.
 * sharp writes no metadata unless asked (keepExif/withMetadata), so leaving them out is the point.
 */
export async function processImage(bytes: Buffer): Promise<ProcessedImage> {
  const kind = sniffImage(bytes);
  if (kind === 'heic') throw new ImageRejectedError('is a HEIC photo, which we cannot read yet: export it as JPEG');
  if (!kind) throw new ImageRejectedError(`is not a ${ACCEPTED_KINDS_TEXT} image`);

  const open = () => sharp(bytes, { autoOrient: true, limitInputPixels: MAX_INPUT_PIXELS, failOn: 'warning' });
  let meta: Metadata;
  try {
    meta = await sharp(bytes, { limitInputPixels: false }).metadata();
  } catch {
    throw new ImageRejectedError('could not be read as an image (damaged or incomplete?)');
  }
  if (meta.format !== DECODER[kind]) throw new ImageRejectedError(`is not a ${ACCEPTED_KINDS_TEXT} image`);
  if (meta.width * meta.height > MAX_INPUT_PIXELS) throw new ImageRejectedError(`has more than ${MAX_INPUT_PIXELS / 1_000_000} megapixels`);

  const variants: ProcessedVariant[] = [];
  try {
    // Decode the original once, down to the largest width we keep (upright, sRGB, no metadata: raw
    // pixels carry none), then make every variant from those pixels rather than decoding it again.
    const widths = variantWidths(meta.autoOrient.width);
    const base = await open()
      .resize({ width: widths[widths.length - 1], withoutEnlargement: true })
      .toColourspace('srgb')
      .raw()
      .toBuffer({ resolveWithObject: true });
    const raw = { width: base.info.width, height: base.info.height, channels: base.info.channels };
    for (const width of widths) {
      const resized = sharp(base.data, { raw }).resize({ width, withoutEnlargement: true });
      const webp = await resized.clone().webp({ quality: 80 }).toBuffer({ resolveWithObject: true });
      const jpeg = await resized.clone().flatten({ background: '#ffffff' }).jpeg({ quality: 80, mozjpeg: true }).toBuffer();
      variants.push({ width: webp.info.width, height: webp.info.height, webp: webp.data, jpeg });
    }
  } catch {
    throw new ImageRejectedError('could not be read as an image (damaged or incomplete?)');
  }
  const largest = variants[variants.length - 1]!;
  return { kind, width: largest.width, height: largest.height, variants };
}
