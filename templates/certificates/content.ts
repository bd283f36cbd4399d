/** What the results sheet and certificates print: finished words and numbers, no rules (the services decide). */
/** `owner` is the owner's public credit in words (name, hometown, club), '' when the results predate it. */
export type PrintLine = { place: string; number: number; title: string; owner: string; total: string; note: string };
export type PrintShow = { name: string; when: string; venue: string };

export type ResultsSheetContent = {
  show: PrintShow;
  publishedOn: string;
  rulesNote: string;
  bestOfShow: PrintLine[];
  /** The visitors' award; each line's total reads "41 votes". */
  peoplesChoice: PrintLine[];
  classes: Array<{ name: string; placings: PrintLine[]; none: string | null }>;
};

export type CertificateContent = {
  show: PrintShow;
  /** "Best of show", "1st place" … */
  award: string;
  /** The class for a class place, else null. */
  className: string | null;
  shared: boolean;
  number: number;
  title: string;
  /** The owner's public credit in words, '' when not known. */
  owner: string;
  total: string;
  /** What the figure is: the judged total, or the visitors' votes. */
  totalLabel: string;
};
