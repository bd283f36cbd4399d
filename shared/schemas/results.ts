import { z } from 'zod';
import { shortText } from './text';
import { ShowResultRulesSchema } from './judging';
import { OwnerCreditSchema } from './owner-credit';

export const PRINT_PAPERS = ['letter', 'a4'] as const;
export type PrintPaper = (typeof PRINT_PAPERS)[number];
export const PRINT_PAPER_LABELS: Record<PrintPaper, string> = { letter: 'US Letter', a4: 'A4' };
export const TIE_BREAK_REASON_MAX = 500;

/** The organiser's result rules, as the settings form sends them (the whole set). */
export const ResultRulesUpdateSchema = ShowResultRulesSchema.extend({ printPaper: z.enum(PRINT_PAPERS, { error: 'Paper is US Letter or A4.' }) });
export type ResultRulesUpdateInput = z.infer<typeof ResultRulesUpdateSchema>;

/** Cars the rules left tied, in the organiser's order (best first), with the reason they give. */
export const TieBreakCreateSchema = z.object({
  entryIds: z
    .array(z.number().int().positive(), { error: 'List the tied cars in their new order.' })
    .min(2, { error: 'Order at least two tied cars.' })
    .max(50)
    .refine((ids) => new Set(ids).size === ids.length, { error: 'Each car appears once.' }),
  reason: shortText('Reason', TIE_BREAK_REASON_MAX).min(3, { error: 'Say why the cars are in this order.' }),
});
export type TieBreakCreateInput = z.infer<typeof TieBreakCreateSchema>;

export const PaperQuerySchema = z.object({ paper: z.enum(PRINT_PAPERS, { error: 'Paper is letter or a4.' }).optional() });
export const CertificateQuerySchema = PaperQuerySchema.extend({ award: z.string().max(80).regex(/^[a-z0-9:-]+$/, { error: 'Unknown award.' }).optional() });

// What is stored when results are published: everything the public page, PDFs, e-mails and owners read.
const SnapshotLineSchema = z.object({
  entryId: z.number(),
  number: z.number(),
  title: z.string(),
  code: z.string(),
  classId: z.number(),
  className: z.string(),
  place: z.number(),
  shared: z.boolean(),
  total: z.number(),
  decidedBy: z.string(),
  /** The owner's public credit as it stood when published; null in results published before owners were named. */
  owner: OwnerCreditSchema.nullable().default(null),
});
export type SnapshotLine = z.infer<typeof SnapshotLineSchema>;

/** One award of a show and the car(s) that won it: a shared place or a shared award has several winners. */
export type Award = {
  /** Stable key for a download: `class:<classId>:<place>`, `best-of-show`, `peoples-choice`. */
  key: string;
  name: string;
  kind: 'class-place' | 'best-of-show' | 'peoples-choice';
  place: number | null;
  className: string | null;
  winners: SnapshotLine[];
};


export const ResultsSnapshotSchema = z.object({
  publishedAt: z.string(),
  rules: ShowResultRulesSchema,
  criteria: z.array(z.object({ id: z.number(), name: z.string(), maxPoints: z.number(), weight: z.number() })),
  classes: z.array(z.object({ classId: z.number(), className: z.string(), placings: z.array(SnapshotLineSchema) })),
  bestOfShow: z.array(SnapshotLineSchema),
  /** The visitors' vote: the car(s) with the most votes, ties shared; null when nobody voted (or before voting existed). */
  peoplesChoice: z
    .object({ votes: z.number(), winners: z.array(SnapshotLineSchema) })
    .nullable()
    .default(null),
  /** Every judged car, placed or not: what its owner is told. */
  entries: z.array(
    z.object({
      entryId: z.number(),
      number: z.number(),
      classId: z.number(),
      place: z.number().nullable(),
      shared: z.boolean(),
      total: z.number().nullable(),
      sheetsCounted: z.number(),
      criterionMeans: z.record(z.string(), z.number()),
    }),
  ),
});
export type ResultsSnapshot = z.infer<typeof ResultsSnapshotSchema>;

/** Totals stay unrounded in the computation; every screen, page, PDF and e-mail rounds them the same way. */
export const totalShown = (total: number) => total.toFixed(2);

// The public face of published results: per class places with number, title, link and rounded total; best of show.
const PublicResultLineSchema = z.object({ place: z.number(), shared: z.boolean(), number: z.number(), title: z.string(), url: z.string(), className: z.string(), total: z.string() });
export type PublicResultLine = z.infer<typeof PublicResultLineSchema>;
export const PublicResultsSchema = z.object({
  publishedAt: z.string(),
  classes: z.array(z.object({ name: z.string(), placings: z.array(PublicResultLineSchema) })),
  bestOfShow: z.array(PublicResultLineSchema),
  /** The visitors' award; each line's `total` reads "41 votes". */
  peoplesChoice: z.array(PublicResultLineSchema),
});
export type PublicResults = z.infer<typeof PublicResultsSchema>;

/** A car's own results, for its owner once published: place, total, each criterion, and the comments if the show shares them. */
export type OwnResults = {
  entryId: number;
  number: number;
  showName: string;
  className: string;
  place: number | null;
  shared: boolean;
  placesAwarded: number;
  bestOfShow: boolean;
  total: string | null;
  sheetsCounted: number;
  criteria: Array<{ name: string; maxPoints: number; weight: number; mean: string; judges: number[] }>;
  comments: Array<{ criterion: string | null; text: string }> | null;
};

export type ManualTieBreakView = { id: number; numbers: number[]; reason: string; by: string; at: string };

/** 1st, 2nd, 3rd, 4th … 11th, 12th, 13th, 21st: English ordinals for places. */
export function ordinal(n: number): string {
  const tens = n % 100;
  const suffix = tens >= 11 && tens <= 13 ? 'th' : ({ 1: 'st', 2: 'nd', 3: 'rd' } as Record<number, string>)[n % 10] ?? 'th';
  return `${n}${suffix}`;
}

/** A place in words, "2nd" or "2nd (shared)". */
export const placeWords = (place: number, shared: boolean) => `${ordinal(place)}${shared ? ' (shared)' : ''}`;

/** How a place was decided against the car next to it, in words for the organiser and the printed sheet. */
export function decidedByWords(decidedBy: { kind: 'score' } | { kind: 'criterion'; criterionId: number } | { kind: 'organiser'; reason: string } | { kind: 'shared' }, criterionName: (id: number) => string | undefined): string {
  switch (decidedBy.kind) {
    case 'score':
      return 'score';
    case 'criterion':
      return `tie broken on ${criterionName(decidedBy.criterionId) ?? 'a criterion'}`;
    case 'organiser':
      return `placed by the organiser: ${decidedBy.reason}`;
    case 'shared':
      return 'shared place';
  }
}

/** An award as the organiser's screen lists it, to print its certificate. */
export type AwardView = { key: string; name: string; winners: Array<{ number: number; title: string; shared: boolean }> };

/**
 * What the organiser is warned of before publishing: cars that were scored but never arrived (their
 * scores count for nothing), and cars that arrived with no finished sheet (they get no place).
 * Publishing with any of these needs `acknowledgeWarnings: true`.
 */
export const PUBLISH_WARNING_KINDS = ['scored_not_arrived', 'no_finished_sheet'] as const;
export type PublishWarningKind = (typeof PUBLISH_WARNING_KINDS)[number];
export type PublishWarningCar = { entryId: number; number: number; title: string; className: string };
export type PublishWarning = { kind: PublishWarningKind; cars: PublishWarningCar[] };

const carList = (cars: PublishWarningCar[]) => cars.map((c) => `No. ${c.number}`).join(', ');
const carCount = (n: number) => (n === 1 ? 'One car' : `${n} cars`);

/** The warning in the organiser's words: what happened and what publishing does about it. */
export function publishWarningWords(w: PublishWarning): string {
  const n = w.cars.length;
  if (w.kind === 'scored_not_arrived') return `${carCount(n)} scored but never checked in at the gate (${carList(w.cars)}): ${n === 1 ? 'its' : 'their'} scores are left out and ${n === 1 ? 'it gets' : 'they get'} no place.`;
  return `${carCount(n)} arrived with no finished sheet (${carList(w.cars)}): ${n === 1 ? 'it gets' : 'they get'} no place unless a judge finishes a sheet first.`;
}

/** The refusal when warnings stand and the organiser has not said to publish anyway. */
export const UNACKNOWLEDGED_WARNINGS_MESSAGE = 'Look at the warnings in the results review first, then publish anyway if they are as they should be.';
