import Papa from 'papaparse';
import { convert, parseUnit, type PowerUnit, type TorqueUnit } from '../calc/units';
import { formatNumber, UNIT_LABELS } from '../calc/format';
import { DYNO_POINT_LIMITS, type CurvePoint } from '../calc/dyno';

// A dyno curve from a CSV file or pasted text, as dyno software exports it: a header row naming an
// rpm, a power and a torque column in any order and any case ("RPM,HP,TQ", "Engine Speed;Power
// (kW);Torque (Nm)", "rpm, Horsepower, Torque (lb-ft)"), possibly after a few lines about the run
// and followed by a row of units; commas, semicolons or tabs between cells; decimal points or
// decimal commas. Other columns (boost, air-fuel ratio, road speed) are passed over.

export type DynoPoint = CurvePoint;
type Column = 'rpm' | 'power' | 'torque';
export type DynoCsvColumns = Record<Column, { index: number; name: string }>;
export type DynoCsvResult =
  /** `lines[i]` is the file's line of `points[i]`, so a later check can still name it. */
  | { ok: true; points: DynoPoint[]; lines: number[]; units: { power: PowerUnit | null; torque: TorqueUnit | null }; columns: DynoCsvColumns }
  | { ok: false; message: string };

/** How far down a file the header may sit (exports put the run's details above it). */
const HEADER_SEARCH_ROWS = 25;

// Header words for each column, matched as whole words after lower-casing. Torque is tried first,
// so "Torque (kW·h)" style oddities never pass for power; rpm before power, so "Power @ RPM" is not rpm.
const WORDS: Record<Column, RegExp> = {
  torque: /\b(torque|tq|trq)\b|^(nm|n·m|n-m|lb-?ft|lbs?-?ft|ft-?lbs?|lbf-?ft)$/,
  rpm: /\b(rpm|revs|1\/min|u\/min|engine speed|motor speed)\b|^rpm$/,
  power: /\b(power|pwr|horsepower|hp|whp|bhp|rwhp|ps|kw|cv)\b/,
};
const POWER_WORDS: Record<string, PowerUnit> = { horsepower: 'hp', rwhp: 'hp' };

const clean = (h: string) => h.replace(/^\uFEFF/, '').trim();

/** The unit a header names, in brackets ("Power (kW)", "Torque [Nm]") or as one of its words ("HP", "Torque lb-ft"). */
function unitOf<K extends 'power' | 'torque'>(kind: K, header: string) {
  const bracketed = header.match(/[([]\s*([^)\]]+?)\s*[)\]]/)?.[1];
  const words = header.toLowerCase().split(/[\s_()[\]]+/).filter(Boolean);
  for (const candidate of [bracketed, header, ...words]) {
    if (!candidate) continue;
    const unit = parseUnit(kind, candidate) ?? (kind === 'power' ? POWER_WORDS[candidate.toLowerCase()] : undefined);
    if (unit) return unit as K extends 'power' ? PowerUnit : TorqueUnit;
  }
  return null;
}

function columnsOf(row: string[]): Partial<DynoCsvColumns> {
  const found: Partial<DynoCsvColumns> = {};
  row.forEach((cell, index) => {
    const name = clean(cell);
    const text = name.toLowerCase();
    if (!text) return;
    const column = (['torque', 'rpm', 'power'] as const).find((c) => WORDS[c].test(text));
    if (column && !found[column]) found[column] = { index, name };
  });
  return found;
}

/**
 * A cell as a number: "5500", "5 500", "312.4", "312,4" (decimal comma), "1.234,5" and "1,234.5"
 * (the last separator is the decimal one). Null when it is not a number.
 */
export function readDecimal(cell: string | undefined): number | null {
  let s = (cell ?? '').replace(/[\s\u00a0\u202f']/g, '');
  if (!s) return null;
  const lastComma = s.lastIndexOf(',');
  const lastDot = s.lastIndexOf('.');
  if (lastComma >= 0 && lastDot >= 0) s = lastComma > lastDot ? s.replace(/\./g, '').replace(',', '.') : s.replace(/,/g, '');
  else if (lastComma >= 0) s = s.indexOf(',') === lastComma ? s.replace(',', '.') : s.replace(/,/g, '');
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(s)) return null;
  return Number(s);
}

const COLUMN_WORDS: Record<Column, string> = { rpm: 'rpm', power: 'power', torque: 'torque' };

type Row = { cells: string[]; line: number };

function rowsOf(text: string, delimiter?: string): Row[] {
  const { data } = Papa.parse(text, delimiter ? { delimiter } : { delimitersToGuess: [';', '\t', ',', '|'] });
  // Blank lines and # notes are passed over here rather than by the parser, so line numbers stay the file's.
  return data.map((cells, i) => ({ cells, line: i + 1 })).filter((r) => r.cells.some((c) => c.trim()) && !r.cells[0]!.trimStart().startsWith('#'));
}

const headerAt = (lines: Row[]) => lines.slice(0, HEADER_SEARCH_ROWS).findIndex((r) => Object.keys(columnsOf(r.cells)).length === 3);

export function parseDynoCsv(input: string): DynoCsvResult {
  const text = input.replace(/^\uFEFF/, '');
  // The separator is the one that splits some early row into the three columns: lines about the run
  // above the header can mislead a guess made from the whole file.
  const split = [';', '\t', ',', '|'].map((d) => rowsOf(text, d)).find((rows) => headerAt(rows) >= 0);
  const lines = split ?? rowsOf(text);
  if (lines.length < 2) return { ok: false, message: 'Give a header row naming the rpm, power and torque columns, then at least one row of numbers.' };

  const at = headerAt(lines);
  if (at < 0) {
    const first = lines[0]!.cells.map(clean).filter(Boolean);
    const have = columnsOf(lines[0]!.cells);
    const missing = (['rpm', 'power', 'torque'] as const).filter((c) => !have[c]).map((c) => COLUMN_WORDS[c]);
    return { ok: false, message: `The header has no ${missing.join(' or ')} column (found: ${first.join(', ')}). Name them, for example RPM, HP and TQ.` };
  }
  const columns = columnsOf(lines[at]!.cells) as DynoCsvColumns;
  let units = { power: unitOf('power', columns.power.name), torque: unitOf('torque', columns.torque.name) };

  let body = lines.slice(at + 1);
  // A row of units under the header ("rpm, kW, Nm"): read, then skipped.
  const unitsRow = body[0];
  const cellOf = (column: Column) => unitsRow?.cells[columns[column].index] ?? '';
  if (unitsRow && readDecimal(cellOf('rpm')) === null && (/rpm|min/i.test(cellOf('rpm')) || unitOf('power', cellOf('power')) || unitOf('torque', cellOf('torque')))) {
    units = { power: units.power ?? unitOf('power', cellOf('power')), torque: units.torque ?? unitOf('torque', cellOf('torque')) };
    body = body.slice(1);
  }
  if (!body.length) return { ok: false, message: 'The header is there, but no row of numbers follows it.' };

  const width = lines[at]!.cells.length;
  const points: DynoPoint[] = [];
  const pointLines: number[] = [];
  for (const { cells, line } of body) {
    // More cells than the header has: most often decimal commas in a file split by commas.
    if (cells.length > width && cells.slice(width).some((c) => c.trim())) return { ok: false, message: `Line ${line} has more cells than the header. Decimal commas need semicolons or tabs between the cells.` };
    const point = {} as DynoPoint;
    for (const column of ['rpm', 'power', 'torque'] as const) {
      const cell = (cells[columns[column].index] ?? '').trim();
      const value = readDecimal(cell);
      if (value === null) return { ok: false, message: cell ? `Line ${line}: "${cell}" in the ${columns[column].name} column is not a number.` : `Line ${line} has no ${columns[column].name} value.` };
      point[column] = value;
    }
    points.push(point);
    pointLines.push(line);
  }
  return { ok: true, points, lines: pointLines, units, columns };
}

const round = (n: number, decimals: number) => Math.round(n * 10 ** decimals) / 10 ** decimals;

type RunUnits = { powerUnit: PowerUnit; torqueUnit: TorqueUnit };

/**
 * A point outside what a run may hold (`DYNO_POINT_LIMITS`), said as the other cell errors are: the
 * line, the cell as written and its column; a converted value also says what it came to.
 */
function outOfRange(point: DynoPoint, read: DynoPoint, line: number, columns: DynoCsvColumns, runUnits: RunUnits): string | null {
  for (const column of ['rpm', 'power', 'torque'] as const) {
    const { min, max } = DYNO_POINT_LIMITS[column];
    const value = point[column];
    if (value >= min && value <= max) continue;
    const unit = column === 'rpm' ? 'rpm' : UNIT_LABELS[column === 'power' ? runUnits.powerUnit : runUnits.torqueUnit];
    const cell = `Line ${line}: ${read[column]} in the ${columns[column].name} column`;
    if (value < 0) return `${cell} is below 0: ${column === 'rpm' ? 'rpm' : column} can’t be negative.`;
    const limit = value < min ? `at least ${formatNumber(min)} ${unit}` : `at most ${formatNumber(max)} ${unit}`;
    return value === read[column] ? `${cell} must be ${limit}.` : `${cell} is ${formatNumber(value)} ${unit}; it must be ${limit}.`;
  }
  return null;
}

/**
 * The curve in the run's own units, checked against what a run may hold and sorted by rpm (some
 * exports list a run-down from the top): a column whose header names another unit ("Power (kW)" for
 * a run in hp) is converted; a header with no unit ("TQ") is read in the run's unit.
 */
export function dynoCurveFromCsv(text: string, runUnits: RunUnits): DynoCsvResult {
  const parsed = parseDynoCsv(text);
  if (!parsed.ok) return parsed;
  const { power, torque } = parsed.units;
  const rows = parsed.points.map((read, i) => {
    const point = {
      rpm: read.rpm,
      power: power && power !== runUnits.powerUnit ? round(convert('power', read.power, power, runUnits.powerUnit), 2) : read.power,
      torque: torque && torque !== runUnits.torqueUnit ? round(convert('torque', read.torque, torque, runUnits.torqueUnit), 2) : read.torque,
    };
    return { point, read, line: parsed.lines[i]! };
  });
  for (const { point, read, line } of rows) {
    const problem = outOfRange(point, read, line, parsed.columns, runUnits);
    if (problem) return { ok: false, message: problem };
  }
  rows.sort((a, b) => a.point.rpm - b.point.rpm || a.line - b.line);
  for (let i = 1; i < rows.length; i++) {
    const [before, after] = [rows[i - 1]!, rows[i]!];
    if (before.point.rpm === after.point.rpm) return { ok: false, message: `Lines ${before.line} and ${after.line} both give ${formatNumber(after.point.rpm)} rpm: keep one row for each rpm.` };
  }
  return { ...parsed, points: rows.map((r) => r.point), lines: rows.map((r) => r.line) };
}
