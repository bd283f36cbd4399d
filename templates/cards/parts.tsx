import { Path, Svg, Text, View } from '@react-pdf/renderer';
import type { CardContent } from './content';
import { FACES } from './fonts';
import { baselineShift, type Line } from './measure';
import { INK, WHITE } from './theme';

/** Quiet zone around the code, in modules: the standard asks for four. */
export const QR_QUIET = 4;

/** The QR code drawn as vector squares, so it stays sharp at any paper size; `size` is the code with its quiet zone. */
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

/**
 * Lines already broken by measure.ts, each in a box of its own height: react-pdf never re-wraps
 * them (they were measured a little short of the width) and maxLines keeps each to one line.
 */
export function Lines({ lines, color = INK, align = 'left' }: { lines: Line[]; color?: string; align?: 'left' | 'center' | 'right' }) {
  return (
    <View>
      {lines.map((line, i) =>
        line.spans.length === 0 ? (
          <View key={i} style={{ height: line.height }} />
        ) : (
          <Text key={i} style={{ height: line.height, fontSize: line.size, lineHeight: (line.height - 0.01) / line.size, maxLines: 1, textAlign: align, color, flexShrink: 0, position: 'relative', top: -baselineShift(line) }}>
            {line.spans.map((s, j) => {
              const face = FACES[s.face];
              const size = line.size * (s.scale ?? 1);
              return (
                <Text key={j} style={{ fontFamily: face.family, fontWeight: face.weight, fontStyle: face.style, fontSize: size, lineHeight: (line.height - 0.01) / size, color: s.color ?? color, letterSpacing: s.letterSpacing ?? 0 }}>
                  {s.text}
                </Text>
              );
            })}
          </Text>
        ),
      )}
    </View>
  );
}
