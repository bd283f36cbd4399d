import { z } from 'zod';
import { SECTION_KINDS, type SectionKind } from './build-sections';
import type { PROVENANCES } from './figure';
import type { PublicBuild } from './build';
import { shortText } from './text';

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

export const CARD_FIGURES = ['power', 'torque', 'weight', 'powerToWeight', 'displacement'] as const;
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
export const CARD_MIN_QR_PT = 1.5 * 72;

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
    .default(['power', 'weight', 'powerToWeight']),
  units: z.enum(UNIT_SYSTEMS, { error: 'Units must be metric or imperial.' }).default('imperial'),
});
export type CardSettings = z.infer<typeof CardSettingsSchema>;
export type CardSettingsInput = z.input<typeof CardSettingsSchema>;
export const DEFAULT_CARD_SETTINGS: CardSettings = CardSettingsSchema.parse({});

/** The show block printed large on a card; filled from the entry once events exist, or typed by the owner. */
export const CardShowSchema = z.object({
  showName: shortText('Show name', 80).optional(),
  className: shortText('Class', 60).optional(),
  entryNumber: shortText('Entry number', 8).optional(),
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
  ...CardShowSchema.shape,
});
export type CardQuery = z.infer<typeof CardQuerySchema>;

/** GET /api/builds/:id/card-settings: what the card designer needs. */
export type CardSettingsResponse = {
  settings: CardSettings;
  saved: boolean;
  build: { id: number; code: string; title: string; published: boolean; publicUrl: string; sections: SectionKind[] };
};

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
};

/** The JSON twin of the public page: the public build plus the computed headline figures. */
export type PublicBuildResponse = { build: PublicBuild & { keyFigures: KeyFigure[]; engineLine: { metric: string; imperial: string } | null } };
