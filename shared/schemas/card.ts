import { z } from 'zod';
import { SECTION_KINDS, type SectionKind } from './build-sections';
import type { PROVENANCES } from './figure';
import type { PublicBuild } from './build';
import { shortText } from './text';
import type { ShownEngineeringFigure } from '../build-sheet/engineering-shown';

/** Our three windshield-card designs. */
export const CARD_DESIGNS = ['poster', 'data-sheet', 'compact'] as const;
export type CardDesign = (typeof CARD_DESIGNS)[number];
export const CARD_DESIGN_LABELS: Record<CardDesign, { name: string; blurb: string }> = {
  poster: { name: 'Poster', blurb: 'Big cover photo, big title and figures, one line per section.' },
  'data-sheet': { name: 'Data sheet', blurb: 'Every chosen section as a block of specs, dense and ruled.' },
  compact: { name: 'Compact', blurb: 'Title, figures and the QR code, large enough to read from a step back.' },
};

export const PAPERS = ['letter', 'a4', 'tabloid', 'a3'] as const;
export type Paper = (typeof PAPERS)[number];
/** Portrait width × height in PDF points (1/72 in). Letter and Tabloid are exact inches; A4 and A3 are ISO 216 millimetres. */
export const PAPER_SIZES_PT: Record<Paper, { width: number; height: number; label: string }> = {
  letter: { width: 612, height: 792, label: 'US Letter (8.5 × 11 in)' },
  a4: { width: (210 / 25.4) * 72, height: (297 / 25.4) * 72, label: 'A4 (210 × 297 mm)' },
  tabloid: { width: 792, height: 1224, label: 'Tabloid (11 × 17 in)' },
  a3: { width: (297 / 25.4) * 72, height: (420 / 25.4) * 72, label: 'A3 (297 × 420 mm)' },
};

export const ORIENTATIONS = ['portrait', 'landscape'] as const;
export type Orientation = (typeof ORIENTATIONS)[number];

/** The headline figures, in the order a card prints them. */
export const CARD_FIGURES = ['power', 'torque', 'weight', 'displacement', 'powerToWeight'] as const;
export type CardFigureKey = (typeof CARD_FIGURES)[number];
export const CARD_FIGURE_LABELS: Record<CardFigureKey, string> = {
  power: 'Power',
  torque: 'Torque',
  weight: 'Weight',
  powerToWeight: 'Power-to-weight',
  displacement: 'Displacement',
};

export const UNIT_SYSTEMS = ['metric', 'imperial'] as const;

/** Print-true limits every design keeps (tests check them). */
export const CARD_MIN_MARGIN_PT = 0.25 * 72;
const MM = 72 / 25.4;

/**
 * Legibility through a windshield, per paper class (Letter and A4 are "small"; Tabloid and A3 "large").
 * - Title and entry number: 12 mm cap height reads at about two metres (common practice, figure from memory: roughly
 *   1 mm of capital height per 170 mm of distance for bold condensed capitals); 16 mm on the large sheets.
 * - Key figures: 8 mm (10 mm large), read from a step back; section lines 10 pt (12 pt large), read up close.
 * - QR code: a code scans from about ten times its width (common practice), so 50 mm scans from
 *   about half a metre through the glass, 75 mm from about three quarters of a metre; the four-module
 *   quiet zone is kept outside that size.
 */
export type Legibility = { titleCapPt: number; entryCapPt: number; figureCapPt: number; linePt: number; qrPt: number };
export const CARD_LEGIBILITY: Record<'small' | 'large', Legibility> = {
  small: { titleCapPt: 12 * MM, entryCapPt: 12 * MM, figureCapPt: 8 * MM, linePt: 10, qrPt: 50 * MM },
  large: { titleCapPt: 16 * MM, entryCapPt: 16 * MM, figureCapPt: 10 * MM, linePt: 12, qrPt: 75 * MM },
};
/**
 * The smallest QR module, 6 pt (1/12 in, 2.1 mm): two pixels a module in a 24 px per inch picture of
 * the card. At 50 mm a 29-module code has 1.6 px modules there and decodes only when the pixel grid
 * happens to fall kindly (measured with jsQR on pdftoppm renders, tests/server/cards); at two
 * pixels every design, paper and orientation decodes. A longer address means more modules, so
 * the code grows with it rather than shrinking its modules.
 */
export const CARD_QR_MODULE_MIN_PT = 6;
export const paperClass = (paper: Paper): keyof typeof CARD_LEGIBILITY => (paper === 'tabloid' || paper === 'a3' ? 'large' : 'small');
/** Entry numbers run 1 to 9999. */
export const CARD_ENTRY_NUMBER_MAX = 9999;
/** The show block's longest show name and class name, in characters: what the designer's boxes take and the API accepts. */
export const CARD_SHOW_NAME_MAX = 80;
export const CARD_CLASS_NAME_MAX = 60;

/** One answered question or one published log post the owner chooses to print on the card. */
export const CARD_HIGHLIGHT_KINDS = ['question', 'log'] as const;
export const CardHighlightSchema = z.object({
  kind: z.enum(CARD_HIGHLIGHT_KINDS, { error: 'Highlight is a question or a log post.' }),
  id: z.number({ error: 'Choose the question or post.' }).int().positive().max(2_147_483_647),
});
export type CardHighlight = z.infer<typeof CardHighlightSchema>;

export const CardSettingsSchema = z.object({
  design: z.enum(CARD_DESIGNS, { error: `Design must be one of ${CARD_DESIGNS.join(', ')}.` }).default('poster'),
  paper: z.enum(PAPERS, { error: `Paper must be one of ${PAPERS.join(', ')}.` }).default('letter'),
  orientation: z.enum(ORIENTATIONS, { error: 'Orientation must be portrait or landscape.' }).default('portrait'),
  sections: z
    .array(z.enum(SECTION_KINDS, { error: `Sections must be among ${SECTION_KINDS.join(', ')}.` }))
    .max(SECTION_KINDS.length)
    .default([...SECTION_KINDS]),
  figures: z
    .array(z.enum(CARD_FIGURES, { error: `Figures must be among ${CARD_FIGURES.join(', ')}.` }))
    .max(CARD_FIGURES.length)
    // All of them: a card prints the ones the build has, so a sparse build still shows what it has.
    .default([...CARD_FIGURES]),
  units: z.enum(UNIT_SYSTEMS, { error: 'Units must be metric or imperial.' }).default('imperial'),
  /** Left out or null: none (settings saved before highlights existed have no such key). */
  highlight: CardHighlightSchema.nullable().optional(),
});
export type CardSettings = z.infer<typeof CardSettingsSchema>;
export type CardSettingsInput = z.input<typeof CardSettingsSchema>;
export const DEFAULT_CARD_SETTINGS: CardSettings = CardSettingsSchema.parse({});

/** The show block printed large on a card; filled from the entry once events exist, or typed by the owner. */
export const CardShowSchema = z.object({
  showName: shortText('Show name', CARD_SHOW_NAME_MAX).optional(),
  className: shortText('Class', CARD_CLASS_NAME_MAX).optional(),
  entryNumber: z
    .string()
    .trim()
    .regex(/^[1-9]\d{0,3}$/, { error: `Entry number must be a whole number from 1 to ${CARD_ENTRY_NUMBER_MAX}.` })
    .optional(),
});
export type CardShow = z.infer<typeof CardShowSchema>;

/** A comma-separated list in a query string ("engine,brakes"); an empty string is an empty list. */
const csv = <T extends z.ZodType>(item: T) =>
  z.preprocess((v) => (typeof v === 'string' ? (v === '' ? [] : v.split(',').map((s) => s.trim())) : v), z.array(item));

/** GET /api/builds/:id/card.pdf: any setting left out falls back to the saved ones, then the defaults. */
export const CardQuerySchema = z.object({
  design: CardSettingsSchema.shape.design.removeDefault().optional(),
  paper: CardSettingsSchema.shape.paper.removeDefault().optional(),
  orientation: CardSettingsSchema.shape.orientation.removeDefault().optional(),
  sections: csv(z.enum(SECTION_KINDS, { error: `Sections must be among ${SECTION_KINDS.join(', ')}.` })).optional(),
  figures: csv(z.enum(CARD_FIGURES, { error: `Figures must be among ${CARD_FIGURES.join(', ')}.` })).optional(),
  units: CardSettingsSchema.shape.units.removeDefault().optional(),
  download: z.enum(['0', '1']).optional(),
  /** The highlight to print: `question:<id>`, `log:<id>` or `none`; left out, the saved one. */
  highlight: z.string().regex(/^(none|(question|log):[1-9][0-9]{0,9})$/, { error: 'Highlight is none, question:<id> or log:<id>.' }).optional(),
  ...CardShowSchema.shape,
});
export type CardQuery = z.infer<typeof CardQuerySchema>;

/** GET /api/builds/:id/card-settings: what the card designer needs. */
export type CardSettingsResponse = {
  settings: CardSettings;
  saved: boolean;
  /** sections: the ones the build has filled in; figures: the headline figures it can print. */
  build: { id: number; code: string; title: string; published: boolean; publicUrl: string; sections: SectionKind[]; figures: CardFigureKey[] };
  /** What the card may carry as its highlight: the answered questions and the published log posts, in words. */
  highlights: Array<CardHighlight & { label: string }>;
};

/** The label printed before a highlight on the card. */
export const CARD_HIGHLIGHT_LABELS: Record<CardHighlight['kind'], string> = { question: 'ASKED OFTEN', log: 'FROM THE BUILD LOG' };

/** The response header of a card PDF naming what did not fit (JSON array of CardLeftOff, URI-encoded). */
export const CARD_LEFT_OFF_HEADER = 'X-Card-Left-Off';
/** Something the card could not print whole: "Story", "Credits: 12 of 40 printed", …; the phone page has it all. */
export type CardLeftOff = { block: string; detail: string };

/** A headline figure already worked out in both systems, with its provenance for the "est." / "target" mark. */
export type KeyFigure = {
  key: CardFigureKey;
  label: string;
  provenance: (typeof PROVENANCES)[number];
  measuredOn?: string;
  /** The photo that backs a measured figure (a scale ticket, a dyno sheet), at its largest size. */
  evidenceUrl?: string;
  /** "at the wheels", "from the latest weigh-in", …: what the number is. */
  note?: string;
  metric: { value: number; unit: string; text: string };
  imperial: { value: number; unit: string; text: string };
  uk: { value: number; unit: string; text: string };
};

/** The JSON twin of the public page: the public build plus the computed headline figures. */
/** The worked-out figures the owner chose to show (brake split, roll centre, camber gain, CG height), in words, with the caution. */
export type PublicEngineering = { metric: ShownEngineeringFigure[]; imperial: ShownEngineeringFigure[]; caution: string };
export type PublicBuildResponse = { build: PublicBuild & { keyFigures: KeyFigure[]; engineLine: { metric: string; imperial: string } | null; engineering: PublicEngineering | null } };
