import { describe, expect, it } from 'vitest';
import { PAGE_CSS } from '@server/pages/page-styles';
import { EVENT_CSS } from '@server/pages/public-event-page';
import { SITE_CSS } from '@server/pages/site-pages';
import { BUILD_LOG_CSS } from '@server/pages/build-log-styles';

// Every text colour of the visitor's pages against what it sits on, by the contrast ratio of
// WCAG 2.2 (W3C Recommendation, definitions "contrast ratio" and "relative luminance"):
// at least 4.5:1, or 3:1 for large text (24 px, or 18.66 px bold), success criterion 1.4.3.

type Rgb = [number, number, number];
const hex = (h: string): { rgb: Rgb; alpha: number } => {
  const s = h.replace('#', '');
  const full = s.length <= 4 ? [...s].map((c) => c + c).join('') : s;
  const n = (i: number) => parseInt(full.slice(i, i + 2), 16) / 255;
  return { rgb: [n(0), n(2), n(4)], alpha: full.length === 8 ? n(6) : 1 };
};
const luminance = ([r, g, b]: Rgb) => {
  const lin = (c: number) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);
  return 0.2126 * lin(r) + 0.7152 * lin(g) + 0.0722 * lin(b);
};
const ratio = (a: Rgb, b: Rgb) => {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x) as [number, number];
  return (hi + 0.05) / (lo + 0.05);
};
const over = (top: { rgb: Rgb; alpha: number }, under: Rgb): Rgb => top.rgb.map((c, i) => c * top.alpha + under[i]! * (1 - top.alpha)) as Rgb;

const css = [PAGE_CSS, EVENT_CSS, SITE_CSS, BUILD_LOG_CSS].join('\n');
const root = Object.fromEntries([...css.matchAll(/(--[\w-]+):(#[0-9a-fA-F]{3,8})/g)].map((m) => [m[1], m[2]]));
const colour = (v: string) => (v.startsWith('var(') ? root[v.slice(4, -1)] : v);
const paper = hex(root['--paper']!).rgb;

/** Each rule that sets a text colour: its selector, colour, background (else the paper) and whether its text is large. */
function textRules() {
  return css.split('}').flatMap((chunk) => {
    const open = chunk.lastIndexOf('{');
    const selector = chunk.slice(0, open).split('{').pop()!.trim();
    const decls = Object.fromEntries(
      chunk
        .slice(open + 1)
        .split(';')
        .map((d) => [d.slice(0, d.indexOf(':')).trim(), d.slice(d.indexOf(':') + 1).trim()]),
    );
    const text = decls.color ? colour(decls.color) : undefined;
    if (!text?.startsWith('#')) return [];
    const bgValue = colour((decls.background ?? decls['background-color'] ?? '').split(' ')[0] ?? '');
    const background = bgValue?.startsWith('#') ? over(hex(bgValue), paper) : paper;
    const size = /(\d*\.?\d+)rem/.exec(decls['font-size'] ?? decls.font ?? '')?.[1];
    const px = size ? Number(size) * 16 : 16;
    const bold = /\b(600|700|bold)\b/.test(`${decls['font-weight'] ?? ''} ${decls.font ?? ''}`);
    return [{ selector, text, background, large: px >= 24 || (bold && px >= 18.66) }];
  });
}

describe('colours of the public pages in sunlight', () => {
  it('finds the text colours to check (the parse is not empty)', () => {
    expect(textRules().length).toBeGreaterThan(8);
  });

  it.each(textRules().map((r) => [r.selector, r]))('%s meets WCAG AA contrast', (_selector, r) => {
    const needed = r.large ? 3 : 4.5;
    expect(ratio(hex(r.text).rgb, r.background)).toBeGreaterThanOrEqual(needed);
  });

  it('the accent used as a text colour would fail on paper, which is why text uses --signal-ink', () => {
    expect(ratio(hex(root['--signal']!).rgb, paper)).toBeLessThan(4.5);
    expect(ratio(hex(root['--signal-ink']!).rgb, paper)).toBeGreaterThanOrEqual(4.5);
  });

  it.each(['.fig dt', '.fig small,.mk', 'ol.runs dt', 'th'])('%s, a figure label or mark, is at least 14 px', (selector) => {
    const rule = new RegExp(`(?:^|\\})${selector.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}\\{([^}]*)\\}`, 'm').exec(css)?.[1] ?? '';
    const rem = Number(/font-size:(\d*\.?\d+)rem/.exec(rule)?.[1] ?? NaN);
    expect(rem * 16).toBeGreaterThanOrEqual(14);
  });
});
