import { describe, expect, it } from 'vitest';
import QRCode from 'qrcode';
import { PNG } from 'pngjs';
import { qrMatrix, qrPng, qrSvg, QR_ERROR_CORRECTION } from '@server/services/builds/cards';
import { QR_QUIET } from '@templates/cards/parts';
import { readQr, readQrPng } from '../../support/pdf';

const URL = 'https://placard.example/c/K7P2M9Q';

describe('QR codes', () => {
  it('decodes the PNG back to the public URL', async () => {
    expect(readQrPng(await qrPng(URL))?.data).toBe(URL);
  });

  it('draws the card code from a module matrix that decodes back to the URL', () => {
    const { size, dark } = qrMatrix(URL);
    const scale = 8;
    const n = (size + QR_QUIET * 2) * scale;
    const png = new PNG({ width: n, height: n });
    for (let y = 0; y < n; y++) {
      for (let x = 0; x < n; x++) {
        const mx = Math.floor(x / scale) - QR_QUIET;
        const my = Math.floor(y / scale) - QR_QUIET;
        const on = mx >= 0 && my >= 0 && mx < size && my < size && dark[my * size + mx];
        const i = (y * n + x) * 4;
        png.data[i] = png.data[i + 1] = png.data[i + 2] = on ? 28 : 255;
        png.data[i + 3] = 255;
      }
    }
    expect(readQr(png)?.data).toBe(URL);
  });

  it('stays a low version at error correction M or better', () => {
    expect(['M', 'Q', 'H']).toContain(QR_ERROR_CORRECTION);
    const code = QRCode.create(URL, { errorCorrectionLevel: QR_ERROR_CORRECTION });
    expect(code.version).toBeLessThanOrEqual(4);
    expect(qrMatrix(URL).size).toBe(code.modules.size);
  });

  it('makes an SVG for owners who make their own boards', async () => {
    const svg = await qrSvg(URL);
    expect(svg).toMatch(/^<svg [^>]*viewBox="0 0 \d+ \d+"/);
    expect(svg.toLowerCase()).toContain('#1c1b19');
  });
});
