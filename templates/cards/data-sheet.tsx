import { Page, Text, View } from '@react-pdf/renderer';
import type { CardProps, CardSection } from './content';
import { DISPLAY, TEXT } from './fonts';
import { clampText, fitHeading, linesNeeded } from './fit';
import { BlockLabel, Figure, Footer, QrBlock, ShowBlock, creditsLine } from './parts';
import { GRAPHITE, INK, PAPER, RULE, SIGNAL, WHITE, pageBox, qrSize } from './theme';

const ROW_LABEL_SHARE = 0.34;

/** Height of one section block at a text size, estimated the way fitBlocks does. */
function blockHeight(s: CardSection, width: number, size: number, cap: number) {
  const valueW = width * (1 - ROW_LABEL_SHARE) - size;
  const labelW = width * ROW_LABEL_SHARE - size;
  const rows = s.rows.reduce((n, r) => n + Math.max(Math.min(2, linesNeeded(r.label, labelW, size * 0.92)), Math.min(cap, linesNeeded(r.value, valueW, size))), 0) + (s.madeBy ? 1 : 0);
  return rows * size * 1.25 + s.rows.length * size * 0.12 + size * 3;
}
const rowLinesAt = (size: number, k: number) => (size <= 5.6 * k ? 1 : size <= 7 * k ? 2 : 4);

/**
 * Data sheet: every chosen section as a ruled block of label / value rows, in two or three
 * columns, under a header with the title, the figures and the QR code. No photo: all spec.
 */
export function DataSheetCard({ content, paper, orientation }: CardProps) {
  const box = pageBox(paper, orientation);
  const { k, margin: m } = box;
  const cw = box.width - 2 * m;
  const ch = box.height - 2 * m;
  const qr = qrSize('data-sheet', box);
  const gap = 10 * k;
  const headerH = qr + 40 * k;
  const footerH = 16 * k;
  const showW = content.show ? Math.round(170 * k) : 0;
  const titleW = cw - qr - gap - (showW ? showW + gap : 0);

  const { size: headingSize } = fitHeading(content.heading.toUpperCase(), titleW, 40 * k, 16 * k);
  const figures = content.figures.slice(0, 5);
  const figW = figures.length ? (cw - (figures.length - 1) * gap) / figures.length : 0;
  const figValue = (figures.length >= 4 ? 22 : 26) * k;
  const figH = figures.length ? figValue * 1.18 + 30 * k : 0;
  const engineH = content.engineLine ? 18 * k : 0;
  const credits = creditsLine(content);
  const creditsH = credits ? 34 * k : 0;

  const cols = box.landscape ? 3 : 2;
  const colW = (cw - (cols - 1) * gap) / cols;
  const gridH = ch - headerH - figH - engineH - creditsH - footerH - gap * 3;

  // Shrink the rows until the blocks, laid into the columns in order, fill no column past the grid.
  const fitsAt = (size: number) => {
    const heights = content.sections.map((s) => blockHeight(s, colW, size, rowLinesAt(size, k)));
    const total = heights.reduce((a, b) => a + b, 0);
    return total <= gridH * cols * 0.92 && Math.max(0, ...heights) <= gridH;
  };
  let size = 11 * k;
  while (size > 5.5 * k && !fitsAt(size)) size -= 0.25 * k;
  // Balance columns: greedily place each block in the column with the least height so far.
  const columns: CardSection[][] = Array.from({ length: cols }, () => []);
  const used = new Array<number>(cols).fill(0);
  for (const s of content.sections) {
    const h = blockHeight(s, colW, size, rowLinesAt(size, k));
    const i = used.indexOf(Math.min(...used));
    columns[i]!.push(s);
    used[i]! += h;
  }
  // Rows get at most a few lines each at the smallest size, so an overlong value cannot push others off.
  const rowLines = rowLinesAt(size, k);

  return (
    <Page size={[box.width, box.height]} wrap={false} style={{ backgroundColor: WHITE, padding: m, fontFamily: TEXT, color: INK }}>
      <View style={{ height: headerH, flexDirection: 'row', borderBottomWidth: 3 * k, borderBottomColor: INK, paddingBottom: 6 * k }}>
        <View style={{ width: titleW, marginRight: gap, justifyContent: 'space-between' }}>
          <View>
            <Text style={{ fontFamily: DISPLAY, fontWeight: 600, fontSize: 9 * k, color: SIGNAL, letterSpacing: 1.5, textTransform: 'uppercase' }}>Build sheet</Text>
            {content.name ? <Text style={{ fontFamily: DISPLAY, fontWeight: 500, fontSize: 12 * k, color: INK, letterSpacing: 0.8, textTransform: 'uppercase', marginTop: 2 * k, maxLines: 1, flexShrink: 0 }}>{content.name}</Text> : null}
            <Text style={{ fontFamily: DISPLAY, fontWeight: 700, fontSize: headingSize, lineHeight: 1.2, textTransform: 'uppercase', maxLines: 2, flexShrink: 0 }}>{clampText(content.heading.toUpperCase(), titleW, headingSize, 2, 'display')}</Text>
          </View>
          <Text style={{ fontFamily: TEXT, fontSize: 9.5 * k, color: GRAPHITE, maxLines: 1, flexShrink: 0 }}>{content.byline}</Text>
        </View>
        {content.show ? (
          <View style={{ width: showW, marginRight: gap }}>
            <ShowBlock show={content.show} width={showW} k={k * 0.85} />
          </View>
        ) : null}
        <QrBlock content={content} size={qr} k={k} caption="Scan: photos, story, dyno" />
      </View>

      {figures.length ? (
        <View style={{ height: figH, flexDirection: 'row', paddingTop: 7 * k, borderBottomWidth: 0.75 * k, borderBottomColor: RULE }}>
          {figures.map((f, i) => (
            <Figure key={f.label} figure={f} valueSize={figValue} width={figW} k={k} style={{ marginRight: i < figures.length - 1 ? gap : 0, paddingLeft: i ? 6 * k : 0, borderLeftWidth: i ? 0.75 * k : 0, borderLeftColor: RULE }} />
          ))}
        </View>
      ) : null}
      {content.engineLine ? (
        <Text style={{ height: engineH, fontFamily: TEXT, fontWeight: 600, fontSize: 10.5 * k, paddingTop: 4 * k, maxLines: 1 }}>{clampText(content.engineLine, cw, 10.5 * k, 1)}</Text>
      ) : null}

      <View style={{ height: gridH, marginTop: gap, flexDirection: 'row', overflow: 'hidden' }}>
        {columns.map((col, ci) => (
          <View key={ci} style={{ width: colW, marginRight: ci < cols - 1 ? gap : 0, height: gridH, overflow: 'hidden' }}>
            <View style={{ position: 'absolute', top: 0, left: 0, right: 0 }}>
            {col.map((s) => (
              <View key={s.label} style={{ marginBottom: size * 0.9, backgroundColor: PAPER, padding: size * 0.5, flexShrink: 0 }}>
                <BlockLabel k={(size / (9 * k)) * k}>{s.label}</BlockLabel>
                {s.rows.map((r, ri) => (
                  <View key={ri} style={{ flexDirection: 'row', marginBottom: size * 0.12, flexShrink: 0 }}>
                    <Text style={{ width: `${ROW_LABEL_SHARE * 100}%`, fontFamily: TEXT, fontSize: size * 0.92, color: GRAPHITE, paddingRight: 3, maxLines: 2 }}>{r.label}</Text>
                    <Text style={{ width: `${(1 - ROW_LABEL_SHARE) * 100}%`, fontFamily: TEXT, fontWeight: 600, fontSize: size, lineHeight: 1.22, maxLines: rowLines }}>{clampText(r.value, colW * (1 - ROW_LABEL_SHARE) - size, size, rowLines)}</Text>
                  </View>
                ))}
                {s.madeBy ? <Text style={{ fontFamily: TEXT, fontStyle: 'italic', fontSize: size * 0.92, color: GRAPHITE, maxLines: 1 }}>Made by: {s.madeBy}</Text> : null}
              </View>
            ))}
            </View>
          </View>
        ))}
      </View>

      {credits ? (
        <View style={{ height: creditsH, marginTop: gap, borderTopWidth: 0.75 * k, borderTopColor: INK, paddingTop: 3 * k }}>
          <Text style={{ fontFamily: TEXT, fontSize: 8.5 * k, color: INK, lineHeight: 1.25, maxLines: 2 }}>
            <Text style={{ fontFamily: DISPLAY, fontWeight: 600, letterSpacing: 1, textTransform: 'uppercase' }}>Credits  </Text>
            {clampText(credits, cw - 60 * k, 8.5 * k, 2)}
          </Text>
        </View>
      ) : null}
      <View style={{ height: footerH, marginTop: gap, justifyContent: 'flex-end' }}>
        <Footer content={content} k={k} />
      </View>
    </Page>
  );
}
