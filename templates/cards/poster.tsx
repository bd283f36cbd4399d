import { Image, Page, Text, View } from '@react-pdf/renderer';
import type { CardProps } from './content';
import { DISPLAY, TEXT } from './fonts';
import { blocksHeight, clampText, fitBlocks, fitHeading, linesNeeded } from './fit';
import { BlockLabel, Figure, Footer, QrBlock, ShowBlock, creditsLine } from './parts';
import { GRAPHITE, INK, RULE, SIGNAL, WHITE, pageBox, qrSize } from './theme';

/**
 * Poster: the cover photo large, the year and body in big condensed capitals, the headline
 * figures on a heavy rule, then one line per section beside a large QR code.
 */
export function PosterCard({ content, paper, orientation }: CardProps) {
  const box = pageBox(paper, orientation);
  const { k, margin: m } = box;
  const cw = box.width - 2 * m;
  const ch = box.height - 2 * m;
  const qr = qrSize('poster', box);
  const qrBlockH = qr + 26 * k;
  const gap = 12 * k;
  const footerH = 16 * k;

  // Column widths: portrait is one column; landscape puts the photo and QR left, the words right.
  const heroW = box.landscape ? Math.round(cw * 0.46) : cw;
  const textW = box.landscape ? cw - heroW - gap * 1.5 : cw;

  const { size: headingSize, lines: headingLines } = fitHeading(content.heading.toUpperCase(), textW, 58 * k, 20 * k);
  const nameSize = 13 * k;
  const titleH = (content.name ? nameSize * 1.35 : 0) + headingSize * 1.2 * Math.min(2, headingLines) + 20 * k;

  const figures = content.figures.slice(0, 5);
  const figCols = box.landscape ? Math.min(3, figures.length) : figures.length;
  const figRows = figCols ? Math.ceil(figures.length / figCols) : 0;
  const figW = figCols ? (textW - (figCols - 1) * 8 * k) / figCols : 0;
  const figValue = (figCols >= 5 ? 24 : figCols === 4 ? 28 : 34) * k;
  const figH = figRows ? figRows * (figValue * 1.18 + 24 * k) + 8 * k : 0;
  const engineSize = 11.5 * k;
  const engineH = content.engineLine ? linesNeeded(content.engineLine, textW, engineSize) * engineSize * 1.25 + 6 * k : 0;
  const credits = creditsLine(content);

  const creditsItem = credits ? [{ text: credits, labelLines: 1 }] : [];
  const items = [...content.sections.map((s) => ({ text: `${s.label}: ${s.summary}`, labelLines: 0 })), ...creditsItem];
  let heroH: number;
  let listW: number;
  let listH: number;
  if (box.landscape) {
    heroH = ch - footerH - qrBlockH - gap;
    listW = textW;
    listH = ch - footerH - titleH - figH - engineH - gap * 2;
  } else {
    const fixed = titleH + figH + engineH + footerH + gap * 3;
    listW = cw - qr - gap * 1.5;
    // The photo gives way to a long list, down to a fifth of the page, so the words stay readable.
    const listWants = Math.max(qrBlockH, blocksHeight(items, listW, 8.5 * k, { gap: 0.45 }) + 10 * k);
    heroH = Math.max(ch * 0.2, Math.min(ch * 0.46, ch - fixed - listWants));
    listH = ch - fixed - heroH;
  }
  const fit = fitBlocks(items, { width: listW, height: listH - 4 * k }, 10.5 * k, 6.5 * k, { gap: 0.45 });

  const hero = content.cover ? (
    <View style={{ width: heroW, height: heroH, backgroundColor: INK }}>
      <Image src={{ data: content.cover.data, format: content.cover.format }} style={{ width: heroW, height: heroH, objectFit: 'cover' }} />
      {content.show && !box.landscape ? (
        <View style={{ position: 'absolute', top: 0, right: 0 }}>
          <ShowBlock show={content.show} width={Math.min(230 * k, heroW * 0.5)} k={k} tone="signal" />
        </View>
      ) : null}
    </View>
  ) : (
    <View style={{ width: heroW, height: heroH, backgroundColor: INK, padding: 18 * k, justifyContent: 'space-between' }}>
      <View style={{ flexDirection: 'row', justifyContent: 'space-between' }}>
        <View style={{ width: 40 * k, height: 5 * k, backgroundColor: SIGNAL }} />
        {content.show && !box.landscape ? <ShowBlock show={content.show} width={Math.min(230 * k, heroW * 0.5)} k={k} tone="signal" /> : null}
      </View>
      <Text style={{ fontFamily: DISPLAY, fontWeight: 700, fontSize: Math.min(heroH * 0.5, 120 * k), color: '#2E2C29', lineHeight: 1, maxLines: 1 }}>{content.heading.split(' ')[0]?.toUpperCase()}</Text>
    </View>
  );

  const title = (
    <View style={{ height: titleH, justifyContent: 'flex-end' }}>
      {content.name ? <Text style={{ fontFamily: DISPLAY, fontWeight: 500, fontSize: nameSize, color: SIGNAL, letterSpacing: 1.2, textTransform: 'uppercase', maxLines: 1, flexShrink: 0 }}>{content.name}</Text> : null}
      <Text style={{ fontFamily: DISPLAY, fontWeight: 700, fontSize: headingSize, color: INK, lineHeight: 1.2, textTransform: 'uppercase', maxLines: 2, flexShrink: 0 }}>{clampText(content.heading.toUpperCase(), textW, headingSize, 2, 'display')}</Text>
      <Text style={{ fontFamily: TEXT, fontSize: 10 * k, color: GRAPHITE, marginTop: 5 * k, maxLines: 1, flexShrink: 0 }}>{content.byline}</Text>
    </View>
  );

  const figureRow = figures.length ? (
    <View style={{ borderTopWidth: 3 * k, borderTopColor: INK, paddingTop: 6 * k, flexDirection: 'row', flexWrap: 'wrap', height: figH }}>
      {figures.map((f, i) => (
        <Figure key={f.label} figure={f} valueSize={figValue} width={figW} k={k} style={{ marginRight: (i + 1) % figCols ? 8 * k : 0, marginBottom: 4 * k }} />
      ))}
    </View>
  ) : null;

  const engine = content.engineLine ? (
    <Text style={{ fontFamily: TEXT, fontWeight: 600, fontSize: engineSize, color: INK, marginTop: 2 * k, height: engineH, maxLines: 3 }}>{clampText(content.engineLine, textW, engineSize, 3)}</Text>
  ) : null;

  const list = (
    <View style={{ width: listW, height: listH, overflow: 'hidden', borderTopWidth: 0.75 * k, borderTopColor: RULE }}>
      <View style={{ position: 'absolute', top: 5 * k, left: 0, right: 0 }}>
      {content.sections.map((s, i) => (
        <Text key={s.label} style={{ fontFamily: TEXT, fontSize: fit.size, lineHeight: 1.25, color: INK, marginBottom: fit.size * 0.45, maxLines: fit.maxLines[i], flexShrink: 0 }}>
          <Text style={{ fontFamily: DISPLAY, fontWeight: 600, color: SIGNAL, textTransform: 'uppercase', letterSpacing: 0.6 }}>{s.label}  </Text>
          {clampText(s.summary, listW, fit.size, fit.maxLines[i] ?? 1)}
        </Text>
      ))}
      {credits ? (
        <View>
          <BlockLabel k={k * 0.9}>Credits</BlockLabel>
          <Text style={{ fontFamily: TEXT, fontSize: fit.size, lineHeight: 1.25, color: GRAPHITE, maxLines: fit.maxLines[content.sections.length] }}>{clampText(credits, listW, fit.size, fit.maxLines[content.sections.length] ?? 1)}</Text>
        </View>
      ) : null}
      </View>
    </View>
  );

  return (
    <Page size={[box.width, box.height]} wrap={false} style={{ backgroundColor: WHITE, padding: m, fontFamily: TEXT, color: INK }}>
      {box.landscape ? (
        <View style={{ flexDirection: 'row', height: ch - footerH }}>
          <View style={{ width: heroW, marginRight: gap * 1.5 }}>
            {hero}
            <View style={{ flexDirection: 'row', marginTop: gap, alignItems: 'flex-start' }}>
              <QrBlock content={content} size={qr} k={k} />
              {content.show ? (
                <View style={{ marginLeft: gap }}>
                  <ShowBlock show={content.show} width={heroW - qr - gap} k={k} tone="signal" />
                </View>
              ) : null}
            </View>
          </View>
          <View style={{ width: textW }}>
            {title}
            <View style={{ height: gap }} />
            {figureRow}
            {engine}
            <View style={{ height: gap }} />
            {list}
          </View>
        </View>
      ) : (
        <View style={{ height: ch - footerH }}>
          {hero}
          <View style={{ height: gap }} />
          {title}
          <View style={{ height: gap }} />
          {figureRow}
          {engine}
          <View style={{ height: gap }} />
          <View style={{ flexDirection: 'row', justifyContent: 'space-between' }}>
            {list}
            <QrBlock content={content} size={qr} k={k} />
          </View>
        </View>
      )}
      <View style={{ height: footerH, justifyContent: 'flex-end' }}>
        <Footer content={content} k={k} />
      </View>
    </Page>
  );
}
