// The shapes the show results are computed from and into. Ids are numbers, as in the database.

export type ResultCriterion = {
  id: number;
  maxPoints: number;
  /** Multiplies the criterion's mean in the total; 1 when every line counts the same. */
  weight: number;
  /** 1 = first tie-break, 2 = second …; null = not used to break ties. */
  tieBreakOrder: number | null;
};

export type ResultEntry = { id: number; classId: number; number: number };

/** One judge's submitted sheet for one car: points per criterion id. Drafts never reach this module. */
export type ResultSheet = { entryId: number; judgeId: number; points: Readonly<Record<number, number>> };

/** The organiser's order for entries the rules left tied, with the reason they recorded. */
export type ManualTieBreak = { entryIds: readonly number[]; reason: string };

export type ResultRules = {
  /** Drop the single highest and lowest sheet (by weighted total) when this many sheets or more were submitted. */
  trimFromSheets: number | null;
  /** Places awarded per class: 3 gives 1st to 3rd. */
  placesPerClass: number;
  /** Best of show is awarded from all scored entries. */
  bestOfShow: boolean;
  /** Whether the best-of-show winner also keeps its class place (else the class is placed without it). */
  bestOfShowKeepsClassPlace: boolean;
  manualTieBreaks?: readonly ManualTieBreak[];
};

export type ResultInput = {
  criteria: readonly ResultCriterion[];
  entries: readonly ResultEntry[];
  sheets: readonly ResultSheet[];
  rules: ResultRules;
};

/** What decided an entry's place against the entry just above it. */
export type DecidedBy =
  | { kind: 'score' }
  | { kind: 'criterion'; criterionId: number }
  | { kind: 'organiser'; reason: string }
  | { kind: 'shared' };

export type EntryScore = {
  entryId: number;
  classId: number;
  number: number;
  /** Sheets submitted for the car, and how many of them count after trimming. */
  sheetsSubmitted: number;
  sheetsCounted: number;
  /** Mean points per criterion id over the counted sheets, unrounded. */
  criterionMeans: Record<number, number>;
  /** Weighted sum of the criterion means, unrounded; round only for display. */
  total: number;
};

export type RankedEntry = EntryScore & {
  /** Standard competition ranking: tied entries share a place and the next place is skipped (1, 2, 2, 4). */
  place: number;
  shared: boolean;
  decidedBy: DecidedBy;
};

/** Entries the rules could not separate and the organiser has not ordered: shown to the organiser. */
export type UnresolvedTie = { scope: 'class' | 'best-of-show'; classId: number | null; place: number; entryIds: number[] };

export type ClassResult = {
  classId: number;
  /** Every scored entry of the class in order (the best-of-show winner left out when it does not keep its place). */
  ranking: RankedEntry[];
  /** The awarded places: ranking entries with place ≤ placesPerClass. */
  placings: RankedEntry[];
  /** Entries with no submitted sheet: not placed. */
  unscored: number[];
};

export type ShowResults = {
  classes: ClassResult[];
  bestOfShow: RankedEntry[];
  ties: UnresolvedTie[];
};
