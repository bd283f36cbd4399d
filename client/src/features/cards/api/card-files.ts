import type { CardSettings, CardShow } from '@shared/schemas/card';

// The card PDF and the QR files are plain GETs the browser opens itself (an <iframe>, a download
// link), so they are URLs rather than fetchers; the session cookie goes with them.

export function cardPdfUrl(buildId: number, s: CardSettings, show: CardShow = {}, opts: { download?: boolean } = {}): string {
  const params = new URLSearchParams({
    design: s.design,
    paper: s.paper,
    orientation: s.orientation,
    sections: s.sections.join(','),
    figures: s.figures.join(','),
    units: s.units,
    highlight: s.highlight ? `${s.highlight.kind}:${s.highlight.id}` : 'none',
  });
  if (show.showName) params.set('showName', show.showName);
  if (show.className) params.set('className', show.className);
  if (show.entryNumber) params.set('entryNumber', show.entryNumber);
  if (opts.download) params.set('download', '1');
  return `/api/builds/${buildId}/card.pdf?${params}`;
}

export const qrFileUrl = (buildId: number, format: 'png' | 'svg') => `/api/builds/${buildId}/qr.${format}`;
