/**
 * Demo photos: simple drawings of our own (a car in profile on a plain ground), made as SVG and
 * turned into JPEG by the seeder. No photos of real cars.
 */
export type Drawing = { body: string; sky: string; ground: string; roof: 'low' | 'tall' | 'wagon' | 'none'; stance: number };

export function carDrawingSvg(d: Drawing, width = 1600, height = 1000): string {
  const groundY = height * 0.78;
  const wheelR = height * 0.09;
  const rearX = width * 0.28;
  const frontX = width * 0.72;
  const bodyTop = groundY - wheelR * 2.1 + d.stance;
  const bodyBottom = groundY - wheelR * 0.6 + d.stance;
  const cab =
    d.roof === 'none'
      ? ''
      : d.roof === 'wagon'
        ? `<path d="M ${width * 0.2} ${bodyTop} L ${width * 0.24} ${bodyTop - height * 0.15} L ${width * 0.56} ${bodyTop - height * 0.15} L ${width * 0.64} ${bodyTop} Z" fill="${d.body}"/>`
        : `<path d="M ${width * 0.34} ${bodyTop} Q ${width * 0.4} ${bodyTop - height * (d.roof === 'low' ? 0.1 : 0.16)} ${width * 0.5} ${bodyTop - height * (d.roof === 'low' ? 0.1 : 0.16)} L ${width * 0.56} ${bodyTop - height * (d.roof === 'low' ? 0.1 : 0.16)} L ${width * 0.62} ${bodyTop} Z" fill="${d.body}"/>`;
  const wheel = (x: number) =>
    `<circle cx="${x}" cy="${groundY - wheelR}" r="${wheelR}" fill="#1C1B19"/><circle cx="${x}" cy="${groundY - wheelR}" r="${wheelR * 0.55}" fill="#B9B4AA"/><circle cx="${x}" cy="${groundY - wheelR}" r="${wheelR * 0.12}" fill="#55524C"/>`;
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">
  <rect width="${width}" height="${groundY}" fill="${d.sky}"/>
  <rect y="${groundY}" width="${width}" height="${height - groundY}" fill="${d.ground}"/>
  <ellipse cx="${width / 2}" cy="${groundY + 6}" rx="${width * 0.36}" ry="${height * 0.02}" fill="#000" opacity="0.25"/>
  ${cab}
  <rect x="${width * 0.14}" y="${bodyTop}" width="${width * 0.72}" height="${bodyBottom - bodyTop}" rx="${height * 0.03}" fill="${d.body}"/>
  <rect x="${width * 0.14}" y="${bodyTop + (bodyBottom - bodyTop) * 0.45}" width="${width * 0.72}" height="${height * 0.008}" fill="#F5F0E6" opacity="0.5"/>
  ${wheel(rearX)}${wheel(frontX)}
</svg>`;
}

/** A drawn stand-in for the photo of a printed dyno sheet: ruled paper, power and torque traces. */
export function dynoSheetSvg(points: { rpm: number; power: number; torque: number }[], width = 1600, height = 1100): string {
  const left = 140, right = width - 80, top = 160, bottom = height - 140;
  const rpms = points.map((p) => p.rpm);
  const [r0, r1] = [Math.min(...rpms), Math.max(...rpms)];
  const most = Math.max(...points.flatMap((p) => [p.power, p.torque])) * 1.1;
  const x = (rpm: number) => left + ((rpm - r0) / (r1 - r0)) * (right - left);
  const y = (v: number) => bottom - (v / most) * (bottom - top);
  const trace = (key: 'power' | 'torque') => points.map((p, i) => `${i ? 'L' : 'M'} ${x(p.rpm).toFixed(1)} ${y(p[key]).toFixed(1)}`).join(' ');
  const grid = Array.from({ length: 11 }, (_, i) => `<line x1="${left}" x2="${right}" y1="${top + (i * (bottom - top)) / 10}" y2="${top + (i * (bottom - top)) / 10}" stroke="#B9C7D8" stroke-width="2"/>`).join('');
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">
  <rect width="${width}" height="${height}" fill="#6B655B"/>
  <rect x="40" y="30" width="${width - 80}" height="${height - 60}" fill="#FBFAF6" transform="rotate(-1.2 ${width / 2} ${height / 2})"/>
  <g transform="rotate(-1.2 ${width / 2} ${height / 2})">
    <rect x="${left}" y="70" width="520" height="40" fill="#1C1B19"/>
    ${grid}
    <path d="${trace('power')}" fill="none" stroke="#A8261B" stroke-width="6"/>
    <path d="${trace('torque')}" fill="none" stroke="#1F4E8C" stroke-width="6" stroke-dasharray="18 10"/>
  </g>
</svg>`;
}
