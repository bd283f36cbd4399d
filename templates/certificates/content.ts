/** What the results sheet and certificates print: finished words and numbers, no rules (the services decide). */
export type PrintLine = { place: string; number: number; title: string; total: string; note: string };
export type PrintShow = { name: string; when: string; venue: string };

export type ResultsSheetContent = {
  show: PrintShow;
  publishedOn: string;
  rulesNote: string;
  bestOfShow: PrintLine[];
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
  total: string;
  /** What the figure is: the judged total, or the visitors' votes. */
  totalLabel: string;
};
