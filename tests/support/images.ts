import { randomBytes } from 'node:crypto';
import sharp from 'sharp';
import { PHOTO_MAX_BYTES } from '@shared/schemas/build';

/** Real image bytes made with sharp, and hostile files that only pretend to be images. */

const solid = (width: number, height: number, background: string) => sharp({ create: { width, height, channels: 3, background } });

/** A 2000×1200 camera-like JPEG carrying EXIF with a GPS position and a camera model. */
export const jpegWithGps = () =>
  solid(2000, 1200, '#8a3b1f')
    .jpeg({ quality: 85 })
    .withExif({
      IFD0: { Make: 'Test Camera', Model: 'Model One', Copyright: 'Test Person' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 12/1', GPSLongitudeRef: 'W', GPSLongitude: '1/1 7/1 40/1' },
    })
    .toBuffer();

/** A 1600×1000 JPEG whose EXIF says "rotate 90° clockwise": upright it is 1000×1600. */
export const sidewaysJpeg = () => solid(1600, 1000, '#334455').jpeg().withMetadata({ orientation: 6 }).toBuffer();

/** A small 300×200 PNG: narrower than every standard width. */
export const smallPng = () => solid(300, 200, '#f2c200').png().toBuffer();

/** A 1000×600 WebP with transparency. */
export const transparentWebp = () =>
  sharp({ create: { width: 1000, height: 600, channels: 4, background: { r: 10, g: 120, b: 60, alpha: 0.5 } } }).webp().toBuffer();

/** A 640×400 AVIF. */
export const smallAvif = () => solid(640, 400, '#552288').avif({ quality: 50, effort: 0 }).toBuffer();

/** A PNG of random noise (it cannot compress) larger than PHOTO_MAX_BYTES. */
export async function oversizedPng(): Promise<Buffer> {
  const side = Math.ceil(Math.sqrt(PHOTO_MAX_BYTES / 3)) + 64;
  return sharp(randomBytes(side * side * 3), { raw: { width: side, height: side, channels: 3 } }).png({ compressionLevel: 0 }).toBuffer();
}

/** True when an EXIF block carries a GPS section (tag 0x8825 in either byte order). */
export const exifHasGps = (exif: Buffer | undefined) =>
  Boolean(exif && (exif.includes(Buffer.from([0x88, 0x25])) || exif.includes(Buffer.from([0x25, 0x88]))));

export const svgFile = () =>
  Buffer.from('<?xml version="1.0"?><svg xmlns="http://www.w3.org/2000/svg" width="100" height="100"><script>alert(1)</script><rect width="100" height="100"/></svg>');
export const htmlFile = () => Buffer.from('<!doctype html><html><body><script>alert(document.cookie)</script></body></html>');
/** JPEG magic bytes followed by garbage: passes a naive check, is no image. */
export const brokenJpeg = () => Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), randomBytes(2000)]);
/** The start of an HEIC file (an ISO-BMFF ftyp box with the heic brand). */
export const heicHeader = () => Buffer.concat([Buffer.from([0, 0, 0, 24]), Buffer.from('ftypheic\0\0\0\0mif1heic', 'latin1'), randomBytes(500)]);
