import { z } from 'zod';
import { shortText } from './text';
import { SCORE_ITEMS_PER_REQUEST_MAX } from '../judging/sheet-state';

// The judge's phone reads these without zod (they are in the code it keeps offline): they live in judging/sheet-state.ts.
export { SCORE_ITEMS_PER_REQUEST_MAX, SHEET_STATES, SHEET_STATE_LABELS, sheetState, type SheetState } from '../judging/sheet-state';

export const SCORE_COMMENT_MAX = 1000;
export const SHEET_NOTE_MAX = 2000;
/** A phone clock this far ahead of the server is refused: its scores would otherwise win every later change. */
export const DEVICE_CLOCK_AHEAD_MAX_MS = 24 * 3600_000;

/** How a show turns sheets into places; stored on the show and read by `shared/calc/results.ts`. */
export const ShowResultRulesSchema = z.object({
  trimFromSheets: z.number().int().min(5, { error: 'Trimming needs at least 5 sheets.' }).max(50).nullable(),
  placesPerClass: z.number().int().min(1).max(10),
  bestOfShow: z.boolean(),
  bestOfShowKeepsClassPlace: z.boolean(),
  shareCommentsWithEntrants: z.boolean(),
  /** The paper the results sheet and certificates print on unless a download asks for the other. */
  printPaper: z.enum(['letter', 'a4']).default('letter'),
});
export type ShowResultRules = z.infer<typeof ShowResultRulesSchema>;
export const DEFAULT_RESULT_RULES: ShowResultRules = { trimFromSheets: null, placesPerClass: 3, bestOfShow: true, bestOfShowKeepsClassPlace: false, shareCommentsWithEntrants: true, printPaper: 'letter' };

/** The organiser's choice of a judge's classes: every class, or a list. */
export const JudgeClassesSchema = z
  .object({
    allClasses: z.boolean({ error: 'Say whether the judge scores every class.' }),
    classIds: z.array(z.number().int().positive()).max(100).default([]),
  })
  .refine((v) => v.allClasses || v.classIds.length > 0, { path: ['classIds'], error: 'Pick at least one class, or every class.' });
export type JudgeClassesInput = z.infer<typeof JudgeClassesSchema>;

const clientId = z.uuid({ error: 'Each score needs the id its device gave it (a UUID).' });
const deviceTime = z.iso.datetime({ offset: true, error: 'Device time must be a date and time with its offset (ISO 8601).' });
/** The phone's own count of the lines it wrote: orders that phone's queue, whatever its clock says. */
const sequence = z.number().int().min(0).max(Number.MAX_SAFE_INTEGER).optional();
const id = (label: string) => z.number({ error: `${label} is required.` }).int().positive({ error: `${label} is required.` });

export const ScoreItemSchema = z.object({
  clientId,
  deviceTime,
  sequence,
  entryId: id('Car'),
  criterionId: id('Criterion'),
  points: z.number({ error: 'Points must be a whole number.' }).int({ error: 'Points must be a whole number.' }).min(0, { error: 'Points cannot be below 0.' }),
  comment: shortText('Comment', SCORE_COMMENT_MAX).default(''),
});
export type ScoreItem = z.infer<typeof ScoreItemSchema>;

export const NoteItemSchema = z.object({
  clientId,
  deviceTime,
  sequence,
  entryId: id('Car'),
  comment: shortText('Comment', SHEET_NOTE_MAX),
});
export type NoteItem = z.infer<typeof NoteItemSchema>;

/**
 * What a judge's phone sends: scores and car comments, each stamped with its id, the phone's sequence
 * and device time, and the phone's own id (`deviceId`). Sends without a phone id (older phones, the
 * demo seeders) are ordered among themselves by device time, as before.
 */
export const ScoreSubmitSchema = z
  .object({
    deviceId: z.uuid({ error: 'The phone’s id must be a UUID.' }).optional(),
    scores: z.array(ScoreItemSchema).max(SCORE_ITEMS_PER_REQUEST_MAX).default([]),
    notes: z.array(NoteItemSchema).max(SCORE_ITEMS_PER_REQUEST_MAX).default([]),
  })
  .refine((v) => v.scores.length + v.notes.length > 0, { path: ['scores'], error: 'Nothing to send.' });
export type ScoreSubmitInput = z.infer<typeof ScoreSubmitSchema>;

/**
 * For each item sent: whether it became the stored value (false = an older or repeated one, ignored), and
 * `replacedByOtherDevice` when the line now holds a value the same judge sent later from another phone.
 */
export const ScoreSubmitResultSchema = z.object({ applied: z.array(z.object({ clientId: z.string(), applied: z.boolean(), replacedByOtherDevice: z.literal(true).optional() })) });
export type ScoreApplied = z.infer<typeof ScoreSubmitResultSchema>['applied'][number];


/** Entries that are judged: only cars the gate checked in. A car that never arrived is neither scored nor ranked. */
export const JUDGED_ENTRY_STATUSES = ['checked_in'] as const;
/** Entries holding a paid or free place that the gate has not checked in yet: the judge's list shows them as still expected. */
export const EXPECTED_ENTRY_STATUSES = ['confirmed'] as const;

export { notArrivedReason } from '../judging/arrival';

// What leaves the server for the judge's phone and the organiser's progress screen.
export type JudgeFigure = { label: string; metric: string; imperial: string; provenance: string };
export type JudgeCar = {
  entryId: number;
  number: number;
  classId: number;
  className: string;
  title: string;
  code: string;
  cover: { url: string; width: number; height: number } | null;
  figures: JudgeFigure[];
};
export type ExpectedCar = { entryId: number; number: number; className: string; title: string };
/** `deviceId`: the phone the stored value came from, so a phone can tell a value another phone of the judge replaced. */
export type MyScore = { entryId: number; criterionId: number; points: number; comment: string; deviceTime: string; clientId: string; deviceId: string | null };
export type MyNote = { entryId: number; comment: string; deviceTime: string; clientId: string; deviceId: string | null };
export type JudgeView = {
  event: { id: number; name: string; slug: string; status: string; judgingOpen: boolean; closedReason: string | null };
  criteria: Array<{ id: number; name: string; maxPoints: number; weight: number; position: number }>;
  /** The cars that arrived: the ones the judge scores. */
  cars: JudgeCar[];
  /** The judge's cars the gate has not checked in yet: listed so the judge knows they may still come, never scored. */
  expected: ExpectedCar[];
  scores: MyScore[];
  notes: MyNote[];
};
export type JudgeSummary = { id: number; name: string; allClasses: boolean; classIds: number[] };
export type JudgingProgress = {
  judgingOpen: boolean;
  lines: number;
  byClass: Array<{ classId: number; name: string; cars: number; bySheets: Array<{ sheets: number; cars: number }> }>;
  byJudge: Array<{ judgeId: number; name: string; allClasses: boolean; classIds: number[]; cars: number; scored: number; partly: number; notYet: number; leftNumbers: number[] }>;
};

export type ResultLine = { entryId: number; number: number; title: string; className: string; place: number; shared: boolean; total: number; totalShown: string; decidedBy: string; sheets: number };
export type ResultsReview = {
  classes: Array<{ classId: number; className: string; placings: ResultLine[]; unscored: number }>;
  bestOfShow: ResultLine[];
  ties: Array<{ scope: 'class' | 'best-of-show'; classId: number | null; place: number; numbers: number[]; cars: Array<{ entryId: number; number: number; title: string }> }>;
};
