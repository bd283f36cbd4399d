// Three plain SVG sketches drawn from the same figures as the numbers: the front view of the
// double wishbone with its instant centre, roll centre and tyre; the camber curve over travel;
// the front/rear brake split. Drawn alike by the server's public page and the editor.
import { formatNumber, type CamberCurve, type FrontGeometryInput, type FrontViewCentres, type Point } from '@shared/calc';

const INK = '#1F1D1A';
const SIGNAL = '#D9481C';
const GRAPHITE = '#55524C';
const f0 = (n: number) => formatNumber(n, { decimals: 0 });

/**
 * Front view of the right-hand corner, centreline on the left; the instant centre is drawn when it fits.
 * `rcHeight` says the roll-centre height in the reader's units ("4.2 in"); without it, millimetres.
 */
export function FrontViewSketch({ input, centres, tyreDiameterMm = 650, tyreWidthMm = 225, rcHeight }: { input: FrontGeometryInput; centres: FrontViewCentres; tyreDiameterMm?: number; tyreWidthMm?: number; rcHeight?: string }) {
  const cp = input.contactPatch;
  const pts: Point[] = [input.upper.inner, input.upper.outer, input.lower.inner, input.lower.outer, cp, { x: 0, y: 0 }, { x: cp.x + tyreWidthMm / 2, y: tyreDiameterMm }];
  const ic = centres.instantCentre;
  // Show the IC only when it is within a few track widths; far away it would shrink the sketch to nothing.
  const icShown = ic && Math.abs(ic.x) < 4 * cp.x && ic.y > -cp.x && ic.y < 2 * cp.x ? ic : null;
  if (icShown) pts.push(icShown);
  const minX = Math.min(...pts.map((p) => p.x)) - 40;
  const maxX = Math.max(...pts.map((p) => p.x)) + 40;
  const maxY = Math.max(...pts.map((p) => p.y)) + 40;
  const minY = Math.min(-40, ...pts.map((p) => p.y - 40));
  const w = maxX - minX;
  const h = maxY - minY;
  const X = (x: number) => x - minX;
  const Y = (y: number) => maxY - y;
  const rc = centres.rollCentreHeightMm;
  const line = (a: Point, b: Point, colour: string, width = 3, dash?: string) => <line x1={X(a.x)} y1={Y(a.y)} x2={X(b.x)} y2={Y(b.y)} stroke={colour} strokeWidth={width * unit} strokeDasharray={dash} strokeLinecap="round" />;
  const label = Math.max(w, h) / 28;
  // Strokes in drawing units: a sketch ~2 m wide drawn 300 px wide needs thick lines to show at all.
  const unit = Math.max(w, h) / 300;
  return (
    <svg viewBox={`0 0 ${Math.ceil(w)} ${Math.ceil(h)}`} role="img" aria-label={`Front view of the front suspension: ${icShown ? 'instant centre and ' : ''}roll centre${rc !== null ? ` at ${rcHeight ?? `${f0(rc)} mm`}` : ''}`} data-testid="front-view-sketch" style={{ width: '100%', height: 'auto', maxHeight: 320 }}>
      {line({ x: minX, y: 0 }, { x: maxX, y: 0 }, GRAPHITE, 1)}
      {line({ x: 0, y: minY }, { x: 0, y: maxY }, GRAPHITE, 1, '12 10')}
      <rect x={X(cp.x - tyreWidthMm / 2)} y={Y(tyreDiameterMm)} width={tyreWidthMm} height={tyreDiameterMm} rx={tyreWidthMm / 4} fill="none" stroke={INK} strokeWidth={2 * unit} />
      {icShown ? (
        <>
          {line(input.upper.outer, icShown, GRAPHITE, 1, '8 8')}
          {line(input.lower.outer, icShown, GRAPHITE, 1, '8 8')}
          {line(cp, icShown, SIGNAL, 1, '4 6')}
          <circle cx={X(icShown.x)} cy={Y(icShown.y)} r={label / 2} fill={GRAPHITE} />
          <text x={X(icShown.x)} y={Y(icShown.y) - label} fontSize={label} fill={GRAPHITE} textAnchor="middle">IC</text>
        </>
      ) : null}
      {line(input.upper.inner, input.upper.outer, INK, 3)}
      {line(input.lower.inner, input.lower.outer, INK)}
      {line(input.upper.outer, input.lower.outer, INK, 2)}
      {rc !== null ? (
        <>
          <circle cx={X(0)} cy={Y(rc)} r={label / 2} fill={SIGNAL} />
          <text x={X(0) + label} y={Y(rc) - label / 2} fontSize={label} fill={SIGNAL}>RC {rcHeight ?? `${f0(rc)} mm`}</text>
        </>
      ) : null}
    </svg>
  );
}

/** Camber change (x) against wheel travel (y), droop at the bottom, bump at the top. */
export function CamberCurveChart({ curve }: { curve: CamberCurve }) {
  const W = 320;
  const H = 240;
  const pad = { l: 48, r: 16, t: 16, b: 36 };
  const steps = curve.steps;
  const maxT = Math.max(10, ...steps.map((s) => Math.abs(s.travelMm)));
  const maxC = Math.max(0.5, ...steps.map((s) => Math.abs(s.camberChangeDeg)));
  const X = (c: number) => pad.l + ((c + maxC) / (2 * maxC)) * (W - pad.l - pad.r);
  const Y = (t: number) => pad.t + ((maxT - t) / (2 * maxT)) * (H - pad.t - pad.b);
  const d = steps.map((s, i) => `${i ? 'L' : 'M'}${X(s.camberChangeDeg).toFixed(1)},${Y(s.travelMm).toFixed(1)}`).join(' ');
  return (
    <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label="Camber change over wheel travel" data-testid="camber-curve-chart" style={{ width: '100%', height: 'auto', maxHeight: 260 }}>
      <line x1={X(0)} y1={pad.t} x2={X(0)} y2={H - pad.b} stroke={GRAPHITE} strokeWidth={1} />
      <line x1={pad.l} y1={Y(0)} x2={W - pad.r} y2={Y(0)} stroke={GRAPHITE} strokeWidth={1} />
      <path d={d} fill="none" stroke={SIGNAL} strokeWidth={2.5} />
      <text x={pad.l} y={H - 8} fontSize={11} fill={GRAPHITE}>−{formatNumber(maxC, { decimals: 1 })}° (top in)</text>
      <text x={W - pad.r} y={H - 8} fontSize={11} fill={GRAPHITE} textAnchor="end">+{formatNumber(maxC, { decimals: 1 })}°</text>
      <text x={4} y={Y(maxT) + 4} fontSize={11} fill={GRAPHITE}>+{f0(maxT)} mm</text>
      <text x={4} y={Y(maxT) + 17} fontSize={11} fill={GRAPHITE}>bump</text>
      <text x={4} y={Y(-maxT) - 13} fontSize={11} fill={GRAPHITE}>droop</text>
      <text x={4} y={Y(-maxT)} fontSize={11} fill={GRAPHITE}>−{f0(maxT)} mm</text>
      <text x={4} y={Y(0) - 4} fontSize={11} fill={GRAPHITE}>ride</text>
    </svg>
  );
}

/** One bar split at the front share of brake torque. */
export function BrakeSplitBar({ frontPercent }: { frontPercent: number }) {
  const W = 320;
  const split = (Math.min(100, Math.max(0, frontPercent)) / 100) * W;
  return (
    <svg viewBox={`0 0 ${W} 44`} role="img" aria-label={`Brake torque: ${f0(frontPercent)} % front, ${f0(100 - frontPercent)} % rear`} data-testid="brake-split-bar" style={{ width: '100%', height: 'auto', maxHeight: 60 }}>
      <rect x={0} y={0} width={split} height={28} fill={SIGNAL} />
      <rect x={split} y={0} width={W - split} height={28} fill={GRAPHITE} />
      <text x={4} y={42} fontSize={12} fill={INK}>Front {f0(frontPercent)} %</text>
      <text x={W - 4} y={42} fontSize={12} fill={INK} textAnchor="end">Rear {f0(100 - frontPercent)} %</text>
    </svg>
  );
}
