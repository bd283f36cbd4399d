import { Page, Text, View } from '@react-pdf/renderer';
import type { CardProps } from './content';
import { DISPLAY, TEXT } from './fonts';
import { clampText, fitBlocks, fitHeading } from './fit';
import { Figure, Footer, QrBlock, ShowBlock } from './parts';
import { GRAPHITE, INK, RULE, SIGNAL, WHITE, pageBox, qrSize } from './theme';

/**
 * Compact: few words, all of them big. Title, three figures stacked, the engine line, a few
 * section lines, and the largest QR code of the three designs: readable from a step back.
 */
export function CompactCard({ content, paper, orientation }: CardProps) {
  const box = pageBox(paper, orientation);
  const { k, margin: m } = box;
  const cw = box.width - 2 * m;
  const ch = box.height - 2 * m;
  const gap = 14 * k;
  const footerH = 16 * k;
  const qr = qrSize('compact', box);
  const sideW = box.landscape ? qr : cw;
  const mainW = box.landscape ? cw - qr - gap * 2 : cw;

  const { size: headingSize, lines: headingLines } = fitHeading(content.heading.toUpperCase(), mainW, 64 * k, 24 * k);
  const figures = content.figures.slice(0, 3);
  const figValue = 44 * k;
  const sections = content.sections.slice(0, 4);
  const figuresH = figures.length * (figValue * 1.18 + 30 * k);
  // Oswald's line box is taller than 1.2 × size in react-pdf: allow 1.32 so the byline never rides on the title.
  const headH = (content.name ? 19 * k : 0) + headingSize * 1.32 * headingLines + 26 * k;
  const qrAreaH = box.landscape ? 0 : qr + 30 * k;
  const topShowH = content.show && !box.landscape ? 126 * k : 0;
  const listH = Math.max(30 * k, ch - footerH - topShowH - headH - (box.landscape ? figuresH : Math.max(figuresH, qrAreaH)) - 34 * k - gap * 3);
  const listW = mainW;
  const fit = fitBlocks(sections.map((s) => ({ text: `${s.label} ${s.summary}` })), { width: listW, height: listH - 8 * k }, 14 * k, 8 * k);

  const figureStack = (
    <View style={{ width: box.landscape ? mainW : cw - qr - gap }}>
      {figures.map((f) => (
        <Figure key={f.label} figure={f} valueSize={figValue} width={box.landscape ? mainW : cw - qr - gap} k={k * 1.15} style={{ borderTopWidth: 2 * k, borderTopColor: INK, paddingTop: 4 * k, marginBottom: 8 * k }} />
      ))}
    </View>
  );

  return (
    <Page size={[box.width, box.height]} wrap={false} style={{ backgroundColor: WHITE, padding: m, fontFamily: TEXT, color: INK }}>
      <View style={{ height: ch - footerH, flexDirection: box.landscape ? 'row' : 'column' }}>
        <View style={{ width: mainW, marginRight: box.landscape ? gap * 2 : 0 }}>
          {topShowH && content.show ? (
            <View style={{ height: topShowH }}>
              <ShowBlock show={content.show} width={cw} k={k} tone="signal" />
            </View>
          ) : null}
          <View style={{ height: headH, justifyContent: 'flex-end', borderBottomWidth: 6 * k, borderBottomColor: SIGNAL, paddingBottom: 6 * k, marginBottom: gap }}>
            {content.name ? <Text style={{ fontFamily: DISPLAY, fontWeight: 500, fontSize: 14 * k, color: SIGNAL, letterSpacing: 1.2, textTransform: 'uppercase', maxLines: 1, flexShrink: 0 }}>{content.name}</Text> : null}
            <Text style={{ fontFamily: DISPLAY, fontWeight: 700, fontSize: headingSize, lineHeight: 1.32, textTransform: 'uppercase', maxLines: 2, flexShrink: 0 }}>{clampText(content.heading.toUpperCase(), mainW, headingSize, 2, 'display')}</Text>
            <Text style={{ fontFamily: TEXT, fontSize: 11 * k, color: GRAPHITE, marginTop: 8 * k, maxLines: 1, flexShrink: 0 }}>{content.byline}</Text>
          </View>
          {box.landscape ? (
            figureStack
          ) : (
            <View style={{ flexDirection: 'row', justifyContent: 'space-between', marginBottom: gap }}>
              {figureStack}
              <QrBlock content={content} size={qr} k={k * 1.2} />
            </View>
          )}
          {content.engineLine ? <Text style={{ fontFamily: TEXT, fontWeight: 600, fontSize: 13 * k, marginBottom: 8 * k, maxLines: 2 }}>{clampText(content.engineLine, mainW, 13 * k, 2)}</Text> : null}
          <View style={{ height: listH, overflow: 'hidden', borderTopWidth: 0.75 * k, borderTopColor: RULE }}>
            <View style={{ position: 'absolute', top: 6 * k, left: 0, right: 0 }}>
            {sections.map((s, i) => (
              <Text key={s.label} style={{ fontSize: fit.size, lineHeight: 1.25, marginBottom: fit.size * 0.5, maxLines: fit.maxLines[i], flexShrink: 0 }}>
                <Text style={{ fontFamily: DISPLAY, fontWeight: 600, textTransform: 'uppercase', letterSpacing: 0.6 }}>{s.label}  </Text>
                {clampText(s.summary, listW, fit.size, fit.maxLines[i] ?? 1)}
              </Text>
            ))}
            </View>
          </View>
        </View>
        {box.landscape ? (
          <View style={{ width: sideW, justifyContent: 'space-between' }}>
            {content.show ? <ShowBlock show={content.show} width={sideW} k={k} tone="signal" /> : <View />}
            <QrBlock content={content} size={qr} k={k * 1.2} />
          </View>
        ) : null}
      </View>
      <View style={{ height: footerH, justifyContent: 'flex-end' }}>
        <Footer content={content} k={k} />
      </View>
    </Page>
  );
}
