// Tyre size codes and the nominal geometry they encode. Metric codes (ETRTO / Tire and Rim
// Association, ISO 4000-1): section width in mm / aspect ratio in % of width, rim in inches.
// Flotation codes: overall diameter × section width, both in inches, then the rim.
import { TyreCodeError, finiteResult } from './errors';
import { UNITS } from './units';

export const NOMINAL_TYRE_NOTE =
  'Nominal figures worked out from the size code. A real tyre differs by a few percent ' +
  '(its loaded radius, tread depth, pressure and make all count); a maker’s data sheet or a ' +
  'measured roll-out is the figure to trust.';

export type TyreConstruction = 'R' | 'ZR' | 'RF' | 'D' | 'B' | '-';

/** What follows the size (load index, speed symbol, markings): kept, but no geometry uses it. */
export interface TyreServiceDescription {
  text: string;
  loadIndex?: number;
  /** The second index of a dual-fitment pair such as 123/120S. */
  dualLoadIndex?: number;
  speedSymbol?: string;
  markings: string[];
}

interface TyreSizeBase {
  /** The code as typed. */
  input: string;
  /** The size part of the code, tidied: "P215/65R15", "33x12.50R15LT". */
  code: string;
  construction: TyreConstruction;
  rimDiameterIn: number;
  /** 'LT' (light truck) or 'C' (commercial) written after the rim diameter. */
  suffix?: 'LT' | 'C';
  service?: TyreServiceDescription;
}

export interface MetricTyreSize extends TyreSizeBase {
  system: 'metric';
  /** P (passenger), LT (light truck), T (temporary spare), ST (special trailer). */
  prefix?: 'P' | 'LT' | 'T' | 'ST';
  sectionWidthMm: number;
  aspectRatio: number;
}

export interface FlotationTyreSize extends TyreSizeBase {
  system: 'flotation';
  overallDiameterIn: number;
  sectionWidthIn: number;
}

export type TyreSize = MetricTyreSize | FlotationTyreSize;

export interface TyreDimensions {
  sectionWidthMm: number;
  sectionWidthIn: number;
  /** Sidewall height as a percentage of the section width. */
  aspectRatio: number;
  sidewallMm: number;
  sidewallIn: number;
  rimDiameterIn: number;
  diameterMm: number;
  diameterIn: number;
  circumferenceMm: number;
  circumferenceIn: number;
  revsPerMile: number;
  revsPerKm: number;
  note: string;
}

const SPEED_SYMBOL = /^(A[1-8]|[B-HJ-NP-WY])$/;
const SERVICE_TOKEN = /^\(?(\d{2,3})(?:\/(\d{2,3}))?([A-Z]\d?)\)?$/;
const MARKINGS = new Set(['XL', 'RF', 'SL', 'HL', 'TL', 'TT', 'M+S', 'M/S', 'REINFORCED']);

export function parseTyreCode(input: string): TyreSize {
  if (typeof input !== 'string' || input.trim() === '') {
    throw new TyreCodeError(String(input), 'the tyre size is empty');
  }
  const text = input.trim().toUpperCase().replace(/×/g, 'X').replace(/\s+/g, ' ');
  if (/^\d{2}(\.\d+)?\s?X/.test(text)) return parseFlotation(input, text);
  if (/^(P|LT|ST|T)?\s?\d/.test(text)) return parseMetric(input, text);
  throw new TyreCodeError(
    input,
    'not a metric size (like 285/35R18) or a flotation size (like 33x12.50R15)',
  );
}

export type TyreParseResult = { ok: true; size: TyreSize } | { ok: false; error: TyreCodeError };

/** For the live editor: the same parse, without throwing while the owner is still typing. */
export function tryParseTyreCode(input: string): TyreParseResult {
  try {
    return { ok: true, size: parseTyreCode(input) };
  } catch (error) {
    if (error instanceof TyreCodeError) return { ok: false, error };
    throw error;
  }
}

export function tyreDimensions(size: TyreSize): TyreDimensions {
  const mmPerIn = UNITS.length.in;
  let sectionWidthMm: number;
  let sidewallMm: number;
  if (size.system === 'metric') {
    sectionWidthMm = size.sectionWidthMm;
    sidewallMm = (size.sectionWidthMm * size.aspectRatio) / 100;
  } else {
    sectionWidthMm = size.sectionWidthIn * mmPerIn;
    sidewallMm = ((size.overallDiameterIn - size.rimDiameterIn) / 2) * mmPerIn;
  }
  const diameterMm = size.rimDiameterIn * mmPerIn + 2 * sidewallMm;
  const circumferenceMm = Math.PI * diameterMm;
  return {
    sectionWidthMm,
    sectionWidthIn: sectionWidthMm / mmPerIn,
    aspectRatio: (sidewallMm / sectionWidthMm) * 100,
    sidewallMm,
    sidewallIn: sidewallMm / mmPerIn,
    rimDiameterIn: size.rimDiameterIn,
    diameterMm,
    diameterIn: diameterMm / mmPerIn,
    circumferenceMm,
    circumferenceIn: circumferenceMm / mmPerIn,
    revsPerMile: finiteResult(UNITS.length.mi / circumferenceMm, 'revsPerMile'),
    revsPerKm: finiteResult(UNITS.length.km / circumferenceMm, 'revsPerKm'),
    note: NOMINAL_TYRE_NOTE,
  };
}

export function tyreDimensionsFromCode(input: string): TyreDimensions {
  return tyreDimensions(parseTyreCode(input));
}

/** Reads a code from left to right, so a failure can say which part is wrong. */
class CodeReader {
  constructor(
    private readonly input: string,
    private rest: string,
  ) {}

  take(pattern: RegExp): RegExpExecArray | undefined {
    const match = pattern.exec(this.rest);
    if (!match) return undefined;
    this.rest = this.rest.slice(match[0].length);
    return match;
  }

  expect(pattern: RegExp, reason: string): string {
    const match = this.take(pattern);
    if (!match?.[1]) throw new TyreCodeError(this.input, reason);
    return match[1];
  }

  remainder(): string {
    return this.rest.trim();
  }

  fail(reason: string): never {
    throw new TyreCodeError(this.input, reason);
  }
}

function parseMetric(input: string, text: string): MetricTyreSize {
  const reader = new CodeReader(input, text);
  const prefix = reader.take(/^(P|LT|ST|T) ?(?=\d)/)?.[1] as MetricTyreSize['prefix'];
  const width = reader.expect(/^(\d+)/, 'expected the section width in millimetres, like 285');
  if (width.length !== 3) reader.fail('the section width should be three digits in millimetres');
  reader.expect(/^ ?(\/) ?/, 'expected "/" and the aspect ratio after the section width');
  const aspect = reader.expect(/^(\d{2,3})/, 'expected the aspect ratio after "/", like 35');
  const construction = readConstruction(reader, /^ ?(ZR|RF|R|D|B|-)/);
  const rim = reader.expect(
    /^ ?(\d{1,2}(?:\.\d)?)/,
    'expected the rim diameter in inches after the construction letter',
  );
  const suffix = reader.take(/^(LT|C)(?![A-Z])/)?.[1] as TyreSizeBase['suffix'];

  const sectionWidthMm = Number(width);
  const aspectRatio = Number(aspect);
  const rimDiameterIn = Number(rim);
  if (sectionWidthMm < 100 || sectionWidthMm > 500) {
    reader.fail('the section width should be between 100 and 500 mm');
  }
  if (aspectRatio < 10 || aspectRatio > 100) {
    reader.fail('the aspect ratio should be between 10 and 100 (percent of the width)');
  }
  checkRim(reader, rimDiameterIn);
  const code = `${prefix ?? ''}${width}/${aspect}${construction}${rim}${suffix ?? ''}`;
  return {
    system: 'metric',
    input,
    code,
    ...(prefix ? { prefix } : {}),
    sectionWidthMm,
    aspectRatio,
    construction,
    rimDiameterIn,
    ...(suffix ? { suffix } : {}),
    ...service(reader),
  };
}

function parseFlotation(input: string, text: string): FlotationTyreSize {
  const reader = new CodeReader(input, text);
  const diameter = reader.expect(
    /^(\d{2}(?:\.\d{1,2})?)/,
    'expected the overall diameter in inches',
  );
  reader.expect(/^ ?(X) ?/, 'expected "x" between the overall diameter and the width');
  const width = reader.expect(
    /^(\d{1,2}(?:\.\d{1,2})?)/,
    'expected the section width in inches after "x", like 12.50',
  );
  const construction = readConstruction(reader, /^ ?(R|D|B|-)/);
  const rim = reader.expect(
    /^ ?(\d{1,2}(?:\.\d)?)/,
    'expected the rim diameter in inches after the construction letter',
  );
  const suffix = reader.take(/^(LT)(?![A-Z])/)?.[1] as TyreSizeBase['suffix'];

  const overallDiameterIn = Number(diameter);
  const sectionWidthIn = Number(width);
  const rimDiameterIn = Number(rim);
  checkRim(reader, rimDiameterIn);
  if (overallDiameterIn <= rimDiameterIn) {
    reader.fail('the overall diameter must be larger than the rim diameter');
  }
  if (sectionWidthIn < 3 || sectionWidthIn >= overallDiameterIn) {
    reader.fail('the section width should be at least 3 in and less than the overall diameter');
  }
  return {
    system: 'flotation',
    input,
    code: `${diameter}x${width}${construction}${rim}${suffix ?? ''}`,
    overallDiameterIn,
    sectionWidthIn,
    construction,
    rimDiameterIn,
    ...(suffix ? { suffix } : {}),
    ...service(reader),
  };
}

function readConstruction(reader: CodeReader, pattern: RegExp): TyreConstruction {
  return reader.expect(
    pattern,
    'expected the construction letter (R for radial, D or - for bias) before the rim diameter',
  ) as TyreConstruction;
}

function checkRim(reader: CodeReader, rimDiameterIn: number): void {
  if (rimDiameterIn < 8 || rimDiameterIn > 30) {
    reader.fail('the rim diameter should be between 8 and 30 inches');
  }
}

function service(reader: CodeReader): { service?: TyreServiceDescription } {
  const text = reader.remainder();
  if (text === '') return {};
  const result: TyreServiceDescription = { text, markings: [] };
  for (const token of text.split(' ')) {
    const load = SERVICE_TOKEN.exec(token);
    const lone = /^\(([A-Z]\d?)\)$/.exec(token);
    if (load?.[1] && load[3] && SPEED_SYMBOL.test(load[3]) && result.loadIndex === undefined) {
      result.loadIndex = Number(load[1]);
      if (load[2]) result.dualLoadIndex = Number(load[2]);
      result.speedSymbol = load[3];
    } else if (lone?.[1] && SPEED_SYMBOL.test(lone[1]) && result.speedSymbol === undefined) {
      result.speedSymbol = lone[1];
    } else if (MARKINGS.has(token)) {
      result.markings.push(token);
    } else {
      reader.fail(`unrecognised text after the size: "${token}"`);
    }
  }
  return { service: result };
}
