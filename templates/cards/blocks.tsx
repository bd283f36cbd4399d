import { Image, View } from '@react-pdf/renderer';
import { CARD_QR_MODULE_MIN_PT, type CardLeftOff, type CardShow, type Legibility } from '@shared/schemas/card';
import type { CardContent } from './content';
import type { BlockSpec, Laid } from './layout';
import { lineWidth, setLines, sizeForCap, textWidth, withEllipsis, type Line, type Span } from './measure';
import { Lines, QrCode, QR_QUIET } from './parts';
import { GRAPHITE, INK, PANEL_YEAR, RULE, SIGNAL, WHITE } from './theme';

/** What every block builder needs: the words, the type scale of the paper and its legibility floor. */
/** `entryNumberScale`: the least scale of the entry number, so an owner's card for an entry prints it as large as the show's numbered card does. */
export type Ctx = { content: CardContent; k: number; leg: Legibility; contentHeight: number; entryNumberScale?: number };

const DISPLAY_LH = 1.12; // capitals only: no descenders to make room for
const TEXT_LH = 1.3;

/** `n` sizes from `max` down to `min` (the floor is always the last). */
export const sizeSteps = (max: number, min: number, n = 6) => (max <= min ? [min] : Array.from({ length: n }, (_, i) => max - ((max - min) * i) / (n - 1)));

/** At most `max` lines; the last one cut with an ellipsis when the text ran on. */
function clamp(lines: Line[], max: number, width: number): Line[] {
  if (lines.length <= max) return lines;
  const kept = lines.slice(0, Math.max(0, max));
  if (kept.length) kept[kept.length - 1] = withEllipsis({ ...kept[kept.length - 1]!, spans: [...kept[kept.length - 1]!.spans, ...lines[max]!.spans.slice(0, 1)] }, width);
  return kept;
}
const height = (lines: Line[]) => lines.reduce((h, l) => h + l.height, 0);

// ---------------------------------------------------------------- title

export function titleBlock({ content, k, leg }: Ctx, growTo = 1.7): BlockSpec {
  const sizes = sizeSteps(sizeForCap(leg.titleCapPt, 'display-700') * growTo, sizeForCap(leg.titleCapPt, 'display-700'));
  const small = Math.max(leg.linePt, 12 * k);
  return {
    label: 'Title',
    steps: sizes.length,
    cuttable: true,
    lay(step, width, maxHeight) {
      const size = sizes[step]!;
      let kicker = content.name ? clamp(setLines([{ text: content.name.toUpperCase(), face: 'display-500', letterSpacing: 0.8 }], small, width, DISPLAY_LH), 2, width) : [];
      let heading = setLines([{ text: content.heading.toUpperCase(), face: 'display-700' }], size, width, DISPLAY_LH);
      let byline = content.byline ? clamp(setLines([{ text: content.byline, face: 'text-400' }], small, width, TEXT_LH), 1, width) : [];
      const leftOff: CardLeftOff[] = [];
      if (maxHeight !== undefined) {
        // The last resort: the byline goes, then the body line, then heading lines.
        if (height([...kicker, ...heading, ...byline]) > maxHeight) byline = [];
        if (height([...kicker, ...heading]) > maxHeight) kicker = [];
        const fit = Math.max(1, Math.floor(maxHeight / (size * DISPLAY_LH)));
        if (heading.length > fit) {
          heading = clamp(heading, fit, width);
          leftOff.push({ block: 'Title', detail: 'cut short' });
        }
      }
      return {
        height: height([...kicker, ...heading, ...byline]),
        leftOff,
        draw: () => (
          <View>
            <Lines lines={kicker} color={SIGNAL} />
            <Lines lines={heading} />
            <Lines lines={byline} color={GRAPHITE} />
          </View>
        ),
      };
    },
  };
}

// ---------------------------------------------------------------- entry block

/**
 * Show name, class and entry number, in the signal colour: what the gate and the judges read from a
 * distance. Any number up to 9999 and names up to the schema's limits fit: a name wraps onto two
 * lines before it shrinks. Reused by the bulk print of a show's cards with each entry's data.
 */
export function layEntryBlock(show: CardShow, width: number, opts: { k: number; leg: Legibility; numberScale?: number }): Laid {
  const { k, leg } = opts;
  const pad = 10 * k;
  const inner = width - 2 * pad;
  // Never wider than the block: four digits at most fill it (a narrow column gets a smaller number, never an overflow).
  const widest = ((inner - 2) * 0.97) / textWidth('8888', 'display-700', 1);
  const numberSize = Math.min(sizeForCap(leg.entryCapPt, 'display-700') * (opts.numberScale ?? 1), Math.max(sizeForCap(leg.entryCapPt, 'display-700'), widest));
  // Room for four digits whatever the number, so a show's cards line up.
  const numberW = show.entryNumber ? Math.max(textWidth('8888', 'display-700', numberSize), textWidth(show.entryNumber, 'display-700', numberSize)) / 0.97 + 2 : 0;
  const labelSize = Math.max(9, 9 * k);
  const numberLines: Line[] = show.entryNumber
    ? [...setLines([{ text: 'ENTRY', face: 'display-500', letterSpacing: 1 }], labelSize, Math.max(numberW, 40), 1.2), ...setLines([{ text: show.entryNumber, face: 'display-700' }], numberSize, numberW, DISPLAY_LH)]
    : [];
  const side = show.entryNumber && inner - numberW - 12 * k >= 130 * k;
  const namesW = side ? inner - numberW - 12 * k : inner;
  const twoLines = (spans: Span[], max: number, min: number, lh: number) => {
    for (const size of sizeSteps(max, min, 8)) {
      const lines = setLines(spans, size, namesW, lh);
      if (lines.length <= 2) return lines;
    }
    return setLines(spans, min, namesW, lh);
  };
  const name = show.showName ? twoLines([{ text: show.showName.toUpperCase(), face: 'display-600' }], Math.max(18 * k, leg.linePt * 1.4), Math.max(leg.linePt, 10 * k), 1.15) : [];
  const cls = show.className ? twoLines([{ text: 'Class ', face: 'text-400' }, { text: show.className, face: 'text-700' }], Math.max(14 * k, leg.linePt * 1.2), leg.linePt, TEXT_LH) : [];
  const gapNames = name.length && cls.length ? 3 * k : 0;
  const namesH = height(name) + gapNames + height(cls);
  const numberH = height(numberLines);
  const gapStack = !side && numberH && namesH ? 6 * k : 0;
  const h = 2 * pad + (side ? Math.max(numberH, namesH) : numberH + gapStack + namesH);
  return {
    height: h,
    draw: (w, boxH) => (
      <View style={{ width: w, height: boxH, backgroundColor: SIGNAL, padding: pad, flexDirection: side ? 'row' : 'column', alignItems: side ? 'center' : 'flex-start' }}>
        {numberLines.length ? (
          <View style={{ width: numberW + 2, marginRight: side ? 12 * k : 0, marginBottom: gapStack }}>
            <Lines lines={numberLines} color={WHITE} />
          </View>
        ) : null}
        <View style={{ width: namesW }}>
          <Lines lines={name} color={WHITE} />
          {gapNames ? <View style={{ height: gapNames }} /> : null}
          <Lines lines={cls} color={WHITE} />
        </View>
      </View>
    ),
  };
}

/**
 * Whether the entry block needs the page's whole width: its number prints larger than the usual steps
 * (as large as the numbered card's) and a column of `columnWidth` would make it smaller.
 */
export function entryAcross(ctx: Ctx, columnWidth = 0): boolean {
  if (!ctx.content.show?.entryNumber || (ctx.entryNumberScale ?? 1) <= 1.25) return false;
  const size = sizeForCap(ctx.leg.entryCapPt, 'display-700') * ctx.entryNumberScale!;
  const needed = Math.max(textWidth('8888', 'display-700', size), textWidth(ctx.content.show.entryNumber, 'display-700', size)) / 0.97 + 2 + 2 * 10 * ctx.k;
  return columnWidth < needed;
}

export function entryBlock(ctx: Ctx): BlockSpec | undefined {
  const show = ctx.content.show;
  if (!show || !(show.showName || show.className || show.entryNumber)) return undefined;
  const least = ctx.entryNumberScale ?? 1;
  const scales = [...new Set([1.25, 1.12, 1].map((s) => Math.max(s, least)))];
  return { label: 'Show entry', steps: scales.length, keep: true, lay: (step, width) => layEntryBlock(show, width, { k: ctx.k, leg: ctx.leg, numberScale: scales[step] }) };
}

// ---------------------------------------------------------------- QR code

/** The side of the drawn QR block (code plus quiet zone) for a code at least `codePt` wide, with modules never under the minimum. */
export const qrBlockSide = (content: CardContent, codePt: number) => {
  const module = Math.max(codePt / content.qr.size, CARD_QR_MODULE_MIN_PT);
  return module * (content.qr.size + 2 * QR_QUIET);
};

export function qrBlock({ content, k, leg }: Ctx, scale = 1): BlockSpec {
  const side = qrBlockSide(content, leg.qrPt * scale);
  return {
    label: 'QR code',
    steps: 1,
    keep: true,
    lay() {
      let urlSize = Math.max(leg.linePt, 13 * k);
      while (urlSize > 7 && textWidth(content.shortUrl, 'display-500', urlSize) > side * 0.97) urlSize -= 0.25;
      const url = setLines([{ text: content.shortUrl, face: 'display-500' }], urlSize, side, 1.25);
      const caption = setLines([{ text: 'Scan for the whole build', face: 'text-400' }], Math.max(leg.linePt * 0.9, 9), side, TEXT_LH);
      return {
        height: side + height(url) + height(caption),
        draw: () => (
          <View style={{ width: side, alignItems: 'center' }}>
            <QrCode qr={content.qr} size={side} />
            <Lines lines={url} align="center" />
            <Lines lines={clamp(caption, 1, side)} color={GRAPHITE} align="center" />
          </View>
        ),
      };
    },
  };
}

// ---------------------------------------------------------------- key figures

export function figuresBlock({ content, k, leg }: Ctx, opts: { maxCols?: number; growTo?: number } = {}): BlockSpec | undefined {
  const figures = content.figures;
  if (!figures.length) return undefined;
  const min = sizeForCap(leg.figureCapPt, 'display-600');
  const sizes = sizeSteps(min * (opts.growTo ?? 1.5), min);
  const gap = 12 * k;
  const labelSize = Math.max(9, 9.5 * k);
  const noteSize = Math.max(8, 8.5 * k);
  const valueSpans = (f: CardContent['figures'][number]): Span[] => [
    { text: f.value, face: 'display-600' },
    { text: ` ${f.unit}`, face: 'display-500', scale: 0.5 },
    ...(f.mark ? [{ text: ` ${f.mark.toUpperCase()}`, face: 'display-500' as const, scale: 0.4, color: SIGNAL }] : []),
  ];
  const rule = 3 * k;
  const padTop = 5 * k;
  return {
    label: 'Key figures',
    steps: sizes.length,
    cuttable: true,
    lay(step, width, maxHeight) {
      const size = sizes[step]!;
      let cols = Math.min(figures.length, opts.maxCols ?? 5);
      // A column count fits when every value and every label fits its cell whole ("POWER-TO-WEIGHT" is never cut).
      const labelSpans = (f: CardContent['figures'][number]): Span[] => [{ text: f.label.toUpperCase(), face: 'display-500', letterSpacing: 0.8 }];
      const fitsIn = (n: number) => {
        const cell = (width - (n - 1) * gap) / n;
        return figures.every((f) => lineWidth(valueSpans(f), size) <= cell * 0.97 && lineWidth(labelSpans(f), labelSize) <= cell);
      };
      while (cols > 1 && !fitsIn(cols)) cols--;
      const cellW = (width - (cols - 1) * gap) / cols;
      const cells = figures.map((f) => ({
        label: clamp(setLines(labelSpans(f), labelSize, cellW, 1.25), 1, cellW),
        value: clamp(setLines(valueSpans(f), size, cellW, DISPLAY_LH), 1, cellW),
        note: f.note ? clamp(setLines([{ text: f.note, face: 'text-400' }], noteSize, cellW, 1.25), 1, cellW) : [],
      }));
      const rows: (typeof cells)[] = [];
      for (let i = 0; i < cells.length; i += cols) rows.push(cells.slice(i, i + cols));
      const rowH = (row: typeof cells) => Math.max(...row.map((c) => height(c.label) + height(c.value) + height(c.note)));
      let kept = rows;
      const total = (rs: typeof rows) => rule + padTop + rs.reduce((h, r) => h + rowH(r), 0) + Math.max(0, rs.length - 1) * 6 * k;
      if (maxHeight !== undefined) while (kept.length && total(kept) > maxHeight) kept = kept.slice(0, -1);
      if (!kept.length) return null;
      const printed = kept.flat().length;
      return {
        height: total(kept),
        leftOff: printed < figures.length ? [{ block: 'Key figures', detail: `${printed} of ${figures.length} printed` }] : [],
        draw: (w) => (
          <View style={{ width: w, borderTopWidth: rule, borderTopColor: INK, paddingTop: padTop }}>
            {kept.map((row, ri) => (
              <View key={ri} style={{ flexDirection: 'row', height: rowH(row), marginTop: ri ? 6 * k : 0 }}>
                {row.map((c, ci) => (
                  <View key={ci} style={{ width: cellW, marginRight: ci < row.length - 1 ? gap : 0 }}>
                    <Lines lines={c.label} color={GRAPHITE} />
                    <Lines lines={c.value} />
                    <Lines lines={c.note} color={GRAPHITE} />
                  </View>
                ))}
              </View>
            ))}
          </View>
        ),
      };
    },
  };
}

// ---------------------------------------------------------------- lists of lines (engine, sections, credits, story)

/** One entry of a list: its name (for what was left off) and its lines at a size and width. */
export type FlowItem = { label: string; lines: (size: number, width: number) => Line[] };

/**
 * Items poured into `cols` columns, top to bottom then left to right. With a height limit it prints
 * what fits, ends a cut item with an ellipsis, and names what was cut short or left off.
 */
export function flowBlock(label: string, items: FlowItem[], sizes: number[], opts: { cols?: number; colGap?: number; itemGap?: number; color?: string }): BlockSpec | undefined {
  if (!items.length) return undefined;
  const cols = opts.cols ?? 1;
  const colGap = opts.colGap ?? 12;
  const linesCache = new Map<string, Line[][]>();
  const itemLines = (size: number, colW: number) => {
    const key = `${size}|${colW}`;
    if (!linesCache.has(key)) linesCache.set(key, items.map((it) => it.lines(size, colW)));
    return linesCache.get(key)!;
  };
  const pour = (size: number, width: number, limit: number) => {
    const colW = (width - (cols - 1) * colGap) / cols;
    const allLines = itemLines(size, colW);
    const columns: Line[][] = [[]];
    const used = [0];
    const status = items.map(() => 'whole' as 'whole' | 'cut' | 'off');
    let full = false;
    items.forEach((item, i) => {
      if (full) return void (status[i] = 'off');
      const lines = allLines[i]!;
      const spacer: Line = { spans: [], size, height: size * (opts.itemGap ?? 0.45) };
      let printed = 0;
      const queue = [...(i && used[used.length - 1]! > 0 ? [spacer] : []), ...lines];
      for (const [li, line] of queue.entries()) {
        const c = columns.length - 1;
        // An item's first line never ends a column alone (a heading without its rows), the last column included.
        const keepWith = line === lines[0] && lines.length > 1 ? lines[1]!.height : 0;
        if (used[c]! + line.height + keepWith > limit + 0.01) {
          // A fresh column takes the line only if it fits there (a limit under one line prints nothing).
          if (columns.length < cols && line.height + keepWith <= limit + 0.01) {
            columns.push([]);
            used.push(0);
            if (line === spacer) continue;
          } else {
            full = true;
            break;
          }
        }
        if (line === spacer && li === 0 && used[columns.length - 1] === 0) continue;
        columns[columns.length - 1]!.push(line);
        used[columns.length - 1]! += line.height;
        if (line !== spacer) printed++;
      }
      if (printed < lines.length) {
        status[i] = printed === 0 ? 'off' : 'cut';
        const col = columns[columns.length - 1]!;
        // A spacer left at the foot of a column is dropped; the last line printed says it runs on.
        while (col.length && col[col.length - 1]!.spans.length === 0) used[columns.length - 1]! -= col.pop()!.height;
        if (printed > 0 && col.length) col[col.length - 1] = withEllipsis(col[col.length - 1]!, colW);
      }
    });
    return { columns, colW, height: Math.max(...used), status };
  };
  const naturals = new Map<string, ReturnType<typeof pour>>();
  const natural = (size: number, width: number) => {
    const key = `${size}|${width}`;
    if (!naturals.has(key)) naturals.set(key, naturalOf(size, width));
    return naturals.get(key)!;
  };
  const naturalOf = (size: number, width: number) => {
    if (cols === 1) return pour(size, width, Infinity);
    const total = itemLines(size, (width - (cols - 1) * colGap) / cols).reduce((h, lines) => h + height(lines), 0);
    let lo = 0;
    let hi = total + items.length * size;
    for (let i = 0; i < 16 && hi - lo > 0.5; i++) {
      const mid = (lo + hi) / 2;
      if (pour(size, width, mid).status.every((s) => s === 'whole')) hi = mid;
      else lo = mid;
    }
    return pour(size, width, hi);
  };
  return {
    label,
    steps: sizes.length,
    cuttable: true,
    lay(step, width, maxHeight) {
      const size = sizes[step]!;
      const result = maxHeight === undefined ? natural(size, width) : pour(size, width, Math.min(maxHeight, natural(size, width).height));
      if (result.height <= 0) return null;
      const off = items.filter((_, i) => result.status[i] === 'off').map((it) => it.label);
      const cut = items.filter((_, i) => result.status[i] === 'cut').map((it) => it.label);
      const leftOff: CardLeftOff[] = [];
      if (cut.length) leftOff.push({ block: label, detail: `cut short: ${cut.join(', ')}` });
      if (off.length) leftOff.push({ block: label, detail: `left off: ${off.join(', ')}` });
      return {
        height: result.height,
        leftOff,
        draw: (w) => (
          <View style={{ width: w, flexDirection: 'row' }}>
            {result.columns.map((col, i) => (
              <View key={i} style={{ width: result.colW, marginRight: i < result.columns.length - 1 ? colGap : 0 }}>
                <Lines lines={col} color={opts.color ?? INK} />
              </View>
            ))}
          </View>
        ),
      };
    },
  };
}

const para = (spans: Span[], lh = TEXT_LH) => (size: number, width: number) => setLines(spans, size, width, lh);
const lineSizes = (leg: Legibility, k: number, grow = 1.35) => sizeSteps(Math.max(leg.linePt, 10 * k) * grow, leg.linePt, 5);

export function engineBlock({ content, k, leg }: Ctx): BlockSpec | undefined {
  if (!content.engineLine) return undefined;
  return flowBlock('Engine line', [{ label: 'Engine', lines: para([{ text: 'ENGINE  ', face: 'display-600', color: SIGNAL, letterSpacing: 0.5 }, { text: content.engineLine, face: 'text-600' }]) }], lineSizes(leg, k, 1.45), {});
}

/** One line per section: the label in the signal colour, then its summary. */
export function sectionLinesBlock({ content, k, leg }: Ctx, cols = 1): BlockSpec | undefined {
  const items = content.sections.filter((s) => s.summary && s.summary !== content.engineLine).map((s) => ({ label: s.label, lines: para([{ text: s.label.toUpperCase(), face: 'display-600', color: SIGNAL, letterSpacing: 0.5 }, { text: `  ${s.summary}`, face: 'text-400' }]) }));
  return flowBlock('Sections', items, lineSizes(leg, k), { cols, colGap: 14 * k });
}

/** Every section as a heading and its label / value rows, poured into columns like a data sheet. */
export function sectionRowsBlock({ content, k, leg }: Ctx, cols: number): BlockSpec | undefined {
  const items = content.sections
    .filter((s) => s.rows.length || s.madeBy)
    .map((s) => ({
      label: s.label,
      lines: (size: number, width: number) => [
        ...setLines([{ text: s.label.toUpperCase(), face: 'display-600', color: SIGNAL, letterSpacing: 1 }], size * 1.05, width, 1.3),
        ...s.rows.flatMap((r) => setLines([{ text: r.label, face: 'text-400', color: GRAPHITE }, { text: `  ${r.value}`, face: 'text-600' }], size, width, 1.25)),
        ...(s.madeBy ? setLines([{ text: `Made by: ${s.madeBy}`, face: 'text-400i', color: GRAPHITE }], size, width, 1.25) : []),
      ],
    }));
  return flowBlock('Sections', items, lineSizes(leg, k, 1.25), { cols, colGap: 14 * k, itemGap: 0.8 });
}

/**
 * The worked-out figures the owner chose to show (brake split, roll centre, camber gain, CG height), as
 * rows like a section's, each marked est.; the engineering caution is the footer's. A block of its own,
 * so the owner's choice is not the first thing a long sheet cuts.
 */
export function engineeringBlock({ content, k, leg }: Ctx): BlockSpec | undefined {
  const rows = content.engineering ?? [];
  if (!rows.length) return undefined;
  const item = {
    label: 'Worked out',
    lines: (size: number, width: number) => [
      ...setLines([{ text: 'WORKED OUT (ESTIMATES)', face: 'display-600', color: SIGNAL, letterSpacing: 1 }], size * 1.05, width, 1.3),
      ...rows.flatMap((r) => setLines([{ text: r.label, face: 'text-400', color: GRAPHITE }, { text: `  ${r.value}`, face: 'text-600' }], size, width, 1.25)),
    ],
  };
  return flowBlock('Worked out', [item], lineSizes(leg, k, 1.25), { colGap: 14 * k });
}

export function creditsBlock({ content, k, leg }: Ctx): BlockSpec | undefined {
  if (!content.credits.length) return undefined;
  const items = content.credits.map((c, i) => ({
    label: `${c.role}: ${c.name}`,
    lines: para([...(i === 0 ? [{ text: 'CREDITS  ', face: 'display-600' as const, letterSpacing: 0.8 }] : []), { text: `${c.role}: `, face: 'text-400', color: GRAPHITE }, { text: c.name, face: 'text-600' }]),
  }));
  const block = flowBlock('Credits', items, lineSizes(leg, k, 1.2), { itemGap: 0.1 });
  if (!block) return undefined;
  // Forty credits make forty names in the list of what was left off: count them instead.
  return {
    ...block,
    lay(step, width, maxHeight) {
      const laid = block.lay(step, width, maxHeight);
      if (!laid?.leftOff?.length) return laid;
      const printed = content.credits.length - laid.leftOff.reduce((n, l) => n + (l.detail.startsWith('left off') ? l.detail.split(', ').length : 0), 0);
      return { ...laid, leftOff: [{ block: 'Credits', detail: `${printed} of ${content.credits.length} printed` }] };
    },
  };
}

/** The owner's chosen highlight: its label in the signal colour, the question or post title, then the words; cut like the story when short of room. */
export function highlightBlock({ content, k, leg }: Ctx): BlockSpec | undefined {
  const h = content.highlight;
  if (!h) return undefined;
  const words = h.text.replace(/\s+/g, ' ').trim();
  const item = { label: 'highlight', lines: para([{ text: `${h.label}  `, face: 'display-600', color: SIGNAL, letterSpacing: 0.8 }, { text: `${h.heading} `, face: 'text-700' }, { text: words, face: 'text-400' }]) };
  const block = flowBlock('Highlight', [item], lineSizes(leg, k, 1.25), { color: INK });
  if (!block) return undefined;
  return {
    ...block,
    lay(step, width, maxHeight) {
      const laid = block.lay(step, width, maxHeight);
      return laid && laid.leftOff?.length ? { ...laid, leftOff: [{ block: 'Highlight', detail: 'cut short' }] } : laid;
    },
  };
}

export function storyBlock({ content, k, leg }: Ctx): BlockSpec | undefined {
  const story = content.story?.trim();
  if (!story) return undefined;
  const paragraphs = story.split(/\n\s*\n/).map((p) => p.replace(/\s+/g, ' ').trim()).filter(Boolean);
  const items = paragraphs.map((p, i) => ({ label: `paragraph ${i + 1}`, lines: para([...(i === 0 ? [{ text: 'STORY  ', face: 'display-600' as const, letterSpacing: 0.8 }] : []), { text: p, face: 'text-400' }]) }));
  const block = flowBlock('Story', items, lineSizes(leg, k, 1.2), { color: INK });
  if (!block) return undefined;
  return {
    ...block,
    lay(step, width, maxHeight) {
      const laid = block.lay(step, width, maxHeight);
      return laid && laid.leftOff?.length ? { ...laid, leftOff: [{ block: 'Story', detail: 'cut short' }] } : laid;
    },
  };
}

// ---------------------------------------------------------------- photo, "more on the phone", footer

/**
 * The cover photo, taking what its column has left (at least a share of the page); without one, a dark
 * panel with the year. With `spareOnly` it asks for no room of its own and only fills what is left over
 * (Compact: a sparse card gets its photo, a full one loses nothing to it).
 */
export function photoBlock({ content, contentHeight }: Ctx, shares = [0.42, 0.32, 0.24, 0.16], opts: { spareOnly?: boolean } = {}): BlockSpec {
  const cover = content.cover;
  const year = content.heading.match(/^\d{4}\b/)?.[0] ?? '';
  const sized = cover && !opts.spareOnly;
  return {
    label: sized ? 'Photo' : '',
    steps: sized ? shares.length : 1,
    grow: true,
    lay: (step) => ({
      height: sized ? contentHeight * shares[step]! : 1,
      draw: (w, h) =>
        h <= 60 ? (
          // Too short to show anything: a sliver of photo or a bare dark stripe reads as a printing fault, so the space stays paper.
          <View style={{ width: w, height: h }} />
        ) : cover ? (
          w / h > (cover.width / cover.height) * 4 ? (
            // Cropped to a strip under a quarter of its height, a photo shows a slice of roof: the whole photo, centred, instead.
            <View style={{ width: w, height: h, alignItems: 'center' }}>
              <Image src={{ data: cover.data, format: cover.format }} style={{ width: (h * cover.width) / cover.height, height: h }} />
            </View>
          ) : (
            <Image src={{ data: cover.data, format: cover.format }} style={{ width: w, height: h, objectFit: 'cover' }} />
          )
        ) : (
          <View style={{ width: w, height: h, backgroundColor: INK, justifyContent: 'flex-end', padding: Math.min(18, h / 6) }}>
            {/* Muted but legible; set in a lighter face than the title's so it never reads (to a PDF reader either) as a second title. */}
            {year ? <Lines lines={setLines([{ text: year, face: 'display-600' }], Math.min(h * 0.55, (w - 40) / (textWidth(year, 'display-600', 1) * 1.05)), w - 36, 1.05)} color={PANEL_YEAR} /> : null}
          </View>
        ),
    }),
  };
}

export function moreBlock({ content, leg }: Ctx): BlockSpec {
  return {
    label: '',
    steps: 1,
    keep: true,
    lay(_, width) {
      const lines = clamp(setLines([{ text: 'More on the phone: ', face: 'text-600' }, { text: content.shortUrl, face: 'display-600', color: SIGNAL }], leg.linePt, width, TEXT_LH), 1, width);
      return { height: height(lines) + 3, draw: (w) => <View style={{ width: w, borderTopWidth: 0.75, borderTopColor: RULE, paddingTop: 2 }}><Lines lines={lines} /></View> };
    },
  };
}

export function footerBlock({ content, k }: Ctx): BlockSpec {
  return {
    label: '',
    steps: 1,
    keep: true,
    lay(_, width) {
      const markSize = 8 * k;
      const markW = textWidth('PLACARD', 'display-600', markSize, 1.5) / 0.97 + 4;
      const caution = content.caution ? clamp(setLines([{ text: content.caution, face: 'text-400' }], Math.max(7, 7 * k), width - markW - 10 * k, 1.25), 2, width - markW - 10 * k) : [];
      const mark = setLines([{ text: 'PLACARD', face: 'display-600', letterSpacing: 1.5 }], markSize, markW + 2, 1.25);
      return {
        height: Math.max(height(caution), height(mark)),
        draw: (w) => (
          <View style={{ width: w, flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-end' }}>
            <View style={{ width: w - markW - 10 * k }}>
              <Lines lines={caution} color={GRAPHITE} />
            </View>
            <View style={{ width: markW + 2 }}>
              <Lines lines={mark} color={GRAPHITE} />
            </View>
          </View>
        ),
      };
    },
  };
}
