import { Path, Svg, Text, View } from '@react-pdf/renderer';
import type { Style } from '@react-pdf/types';
import type { CardContent, CardFigure } from './content';
import { DISPLAY, TEXT } from './fonts';
import { GRAPHITE, INK, RULE, SIGNAL, WHITE } from './theme';
import { clampText, displayWidth, fitDisplaySize } from './fit';

/** Quiet zone around the code, in modules: the standard asks for four. */
export const QR_QUIET = 4;

/** The QR code drawn as vector squares, so it stays sharp at any paper size. */
export function QrCode({ qr, size }: { qr: CardContent['qr']; size: number }) {
  const n = qr.size + QR_QUIET * 2;
  let d = '';
  for (let y = 0; y < qr.size; y++) {
    for (let x = 0; x < qr.size; x++) {
      if (qr.dark[y * qr.size + x]) d += `M${x + QR_QUIET} ${y + QR_QUIET}h1v1h-1z`;
    }
  }
  return (
    <Svg width={size} height={size} viewBox={`0 0 ${n} ${n}`} style={{ backgroundColor: WHITE, flexShrink: 0 }}>
      <Path d={d} fill={INK} />
    </Svg>
  );
}

/** The QR code with its short URL under it and a line saying what it opens. */
export function QrBlock({ content, size, k, dark = false, caption = 'Scan for the whole build' }: { content: CardContent; size: number; k: number; dark?: boolean; caption?: string }) {
  const urlSize = fitDisplaySize(content.shortUrl, size, 11 * k, 6 * k);
  return (
    <View style={{ width: size, alignItems: 'center', flexShrink: 0 }}>
      <QrCode qr={content.qr} size={size} />
      <Text style={{ fontFamily: DISPLAY, fontWeight: 500, fontSize: urlSize, color: dark ? WHITE : INK, marginTop: 4 * k, letterSpacing: 0.2, maxLines: 1 }}>{content.shortUrl}</Text>
      <Text style={{ fontFamily: TEXT, fontSize: 7.5 * k, color: dark ? RULE : GRAPHITE, marginTop: 1 * k, maxLines: 1 }}>{caption}</Text>
    </View>
  );
}

/** Show name, class and entry number, large: what a judge or a gate reads from a distance. */
export function ShowBlock({ show, width, k, tone = 'light' }: { show: NonNullable<CardContent['show']>; width: number; k: number; tone?: 'light' | 'signal' }) {
  const fg = tone === 'signal' ? WHITE : INK;
  const sub = tone === 'signal' ? WHITE : GRAPHITE;
  const pad = 10 * k;
  const inner = width - 2 * pad - 4 * k;
  const stacked = width < 200 * k || !show.showName;
  const numberSize = show.entryNumber ? fitDisplaySize(show.entryNumber, ((stacked ? inner : inner * 0.5) - 8 * k) / 1.2, 64 * k, 22 * k) : 0;
  const numberW = show.entryNumber ? Math.min(stacked ? inner : inner * 0.5, displayWidth(show.entryNumber, numberSize) * 1.2 + 8 * k) : 0;
  const nameW = stacked ? inner : inner - numberW - 10 * k;
  return (
    <View style={{ width, flexShrink: 0, backgroundColor: tone === 'signal' ? SIGNAL : WHITE, borderWidth: 2 * k, borderColor: tone === 'signal' ? SIGNAL : INK, padding: pad, flexDirection: stacked ? 'column' : 'row', alignItems: stacked ? 'flex-start' : 'center' }}>
      {show.entryNumber ? (
        <View style={{ width: numberW, marginRight: stacked ? 0 : 10 * k, flexShrink: 0 }}>
          <Text style={{ fontFamily: DISPLAY, fontSize: 7.5 * k, color: sub, letterSpacing: 1, textTransform: 'uppercase' }}>Entry</Text>
          <Text style={{ fontFamily: DISPLAY, fontWeight: 700, fontSize: numberSize, color: fg, lineHeight: 1.1, maxLines: 1 }}>{show.entryNumber}</Text>
        </View>
      ) : null}
      <View style={{ width: nameW, flexShrink: 0 }}>
        {show.showName ? <Text style={{ fontFamily: DISPLAY, fontWeight: 600, fontSize: 14 * k, color: fg, textTransform: 'uppercase', lineHeight: 1.15, maxLines: 2 }}>{clampText(show.showName.toUpperCase(), nameW, 14 * k, 2, 'display')}</Text> : null}
        {show.className ? (
          <Text style={{ fontFamily: TEXT, fontSize: 10 * k, color: sub, marginTop: 2 * k, maxLines: 2 }}>
            Class: <Text style={{ fontWeight: 700, color: fg }}>{show.className}</Text>
          </Text>
        ) : null}
      </View>
    </View>
  );
}

/** "est." and "target" in words, in the signal colour, beside the figure they qualify. */
export function Mark({ mark, size, color = SIGNAL }: { mark: string; size: number; color?: string }) {
  if (!mark) return null;
  return <Text style={{ fontFamily: DISPLAY, fontWeight: 500, fontSize: size, color, textTransform: 'uppercase', letterSpacing: 0.5 }}>{` ${mark}`}</Text>;
}

/** One headline figure: label above, value big, unit and provenance mark beside it. */
export function Figure({ figure, valueSize, width, k, dark = false, style }: { figure: CardFigure; valueSize: number; width: number; k: number; dark?: boolean; style?: Style }) {
  const fg = dark ? WHITE : INK;
  const size = Math.min(valueSize, fitDisplaySize(`${figure.value} ${figure.unit} ${figure.mark}`, width, valueSize, valueSize * 0.45));
  return (
    <View style={style ? [{ width }, style] : { width }}>
      <Text style={{ fontFamily: DISPLAY, fontSize: 8 * k, letterSpacing: 1, color: dark ? RULE : GRAPHITE, textTransform: 'uppercase', maxLines: 1 }}>{figure.label}</Text>
      <Text style={{ fontFamily: DISPLAY, fontWeight: 600, fontSize: size, color: fg, lineHeight: 1.18, maxLines: 1 }}>
        {figure.value}
        <Text style={{ fontSize: size * 0.5, fontWeight: 500 }}>{` ${figure.unit}`}</Text>
        <Mark mark={figure.mark} size={size * 0.36} color={dark ? '#F08A63' : SIGNAL} />
      </Text>
      {figure.note ? <Text style={{ fontFamily: TEXT, fontSize: 7 * k, marginTop: size * 0.2, color: dark ? RULE : GRAPHITE, maxLines: 1 }}>{figure.note}</Text> : null}
    </View>
  );
}

/** Small caps label with a thin rule under it, like a block heading on a data sheet. */
export function BlockLabel({ children, k, color = INK, rule = INK }: { children: string; k: number; color?: string; rule?: string }) {
  return (
    <Text style={{ fontFamily: DISPLAY, fontWeight: 600, fontSize: 9 * k, letterSpacing: 1.2, color, textTransform: 'uppercase', borderBottomWidth: 0.75 * k, borderBottomColor: rule, paddingBottom: 1.5 * k, marginBottom: 3 * k, maxLines: 1 }}>
      {children}
    </Text>
  );
}

/** "Placard" in small type at the foot of a card. */
export function Footer({ content, k, color = GRAPHITE }: { content: CardContent; k: number; color?: string }) {
  return (
    <View style={{ flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-end' }}>
      <Text style={{ fontFamily: TEXT, fontSize: 6.5 * k, color, maxLines: 2, flexShrink: 1, marginRight: 8 * k }}>{content.caution ?? ''}</Text>
      <Text style={{ fontFamily: DISPLAY, fontWeight: 600, fontSize: 8 * k, color, letterSpacing: 1.5, textTransform: 'uppercase' }}>Placard</Text>
    </View>
  );
}

export const creditsLine = (content: CardContent) => content.credits.map((c) => `${c.role}: ${c.name}`).join('  ·  ');
