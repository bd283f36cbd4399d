import { z } from 'zod';
import { boundedNumber, figureSchema, plainMm, shortText, type FigureInput } from './figure';
import { MM_RANGES } from './build-sections';
import type { Sections, SectionKind } from './build-sections';
import { dynoCurveFromCsv } from './dyno-csv';
import { curvePeaks, DYNO_PEAK_LIMITS, DYNO_POINT_LIMITS, type CurvePeaks } from '../calc/dyno';
import { text } from './text';
import { calendarDate } from './dates';
import { megabytes } from '../words';
import { BUILD_CODE_ALPHABET, BUILD_CODE_LENGTH } from '../build-code';

export const BUILD_STYLES = ['hot-rod', 'street-rod', 'custom', 'restomod', 'pro-touring', 'muscle', 'gasser', 'rat-rod', 'lowrider', 'truck', 'drag', 'other'] as const;
export const BUILD_STYLE_LABELS: Record<(typeof BUILD_STYLES)[number], string> = {
  'hot-rod': 'Hot rod',
  'street-rod': 'Street rod',
  custom: 'Custom',
  restomod: 'Restomod',
  'pro-touring': 'Pro touring',
  muscle: 'Muscle',
  gasser: 'Gasser',
  'rat-rod': 'Rat rod',
  lowrider: 'Lowrider',
  truck: 'Truck',
  drag: 'Drag car',
  other: 'Other',
};

export { BUILD_CODE_ALPHABET, BUILD_CODE_LENGTH };
export const BuildCodeSchema = z.string().regex(new RegExp(`^[${BUILD_CODE_ALPHABET}]{6,8}$`), { error: 'Not a build code.' });

export const TITLE_MAX = 120;
export const STORY_MAX = 10_000;

const currentYear = new Date().getFullYear();
export const BuildOverviewSchema = z.object({
  title: text('Title').trim().min(1, { error: 'Give the build a title.' }).max(TITLE_MAX, { error: `Title must be at most ${TITLE_MAX} characters.` }),
  modelYear: boundedNumber('Model year', 1885, currentYear + 2, { int: true }).nullable().optional(),
  bodyOrigin: shortText('Body origin', 200).optional(),
  style: z.enum(BUILD_STYLES, { error: 'Choose a style.' }).nullable().optional(),
  story: text('Story').max(STORY_MAX, { error: `The story must be at most ${STORY_MAX} characters.` }).optional(),
  weight: figureSchema('mass', { label: 'Weight', min: 100, max: 10_000, unit: 'kg' }).nullable().optional(),
});
export const BuildCreateSchema = BuildOverviewSchema.pick({ title: true, modelYear: true, bodyOrigin: true, style: true });
export type BuildCreateInput = z.infer<typeof BuildCreateSchema>;
export const BuildUpdateSchema = BuildOverviewSchema.partial();
export type BuildUpdateInput = z.infer<typeof BuildUpdateSchema>;

/** Never on a public page, public API or card: the owner and (with events) the show's organisers only. */
export const BuildPrivateSchema = z.object({
  vin: shortText('VIN or chassis number', 40).optional(),
  plate: shortText('Plate', 20).optional(),
  ownerPhone: shortText('Phone', 40).optional(),
  ownerAddress: shortText('Address', 400).optional(),
});
export type BuildPrivate = z.infer<typeof BuildPrivateSchema>;
export const PRIVATE_FIELD_NAMES = ['vin', 'plate', 'ownerPhone', 'ownerAddress'] as const;

export const CREDIT_ROLES = ['paint', 'body', 'chassis', 'engine build', 'upholstery', 'wiring', 'fabrication', 'machining', 'other'] as const;
/** How long a credit's words may be, and how many credits a build holds: the editor's boxes stop there too. */
export const CREDIT_LIMITS = { role: 60, name: 120, count: 40 } as const;
export const CreditSchema = z.object({
  role: shortText('Role', CREDIT_LIMITS.role).min(1, { error: 'Say what they did.' }),
  name: shortText('Name', CREDIT_LIMITS.name).min(1, { error: 'Say who did it.' }),
});
export const CreditsSchema = z.object({ credits: z.array(CreditSchema).max(CREDIT_LIMITS.count, { error: `At most ${CREDIT_LIMITS.count} credits.` }) });
export type Credit = z.infer<typeof CreditSchema>;

export const PublishSchema = z.object({ published: z.boolean({ error: 'Published must be true or false.' }) });

// Photos
export const PHOTO_WIDTHS = [480, 960, 1600] as const;
export const PHOTO_MAX_BYTES = 15 * 1024 * 1024;
export const PHOTO_MAX_FILES = 12;
export const PHOTO_CAPTION_MAX = 300;
export const photoTooLargeMessage = () => `Each photo must be at most ${megabytes(PHOTO_MAX_BYTES)}.`;
export const PhotoSchema = z.object({
  id: z.number().int(),
  caption: z.string(),
  position: z.number().int(),
  isCover: z.boolean(),
  width: z.number().int(),
  height: z.number().int(),
  /** One URL per stored width and format, smallest first. */
  sources: z.array(z.object({ width: z.number().int(), height: z.number().int(), webp: z.string(), jpeg: z.string() })),
});
export type Photo = z.infer<typeof PhotoSchema>;
export const PhotoUpdateSchema = z.object({ caption: shortText('Caption', PHOTO_CAPTION_MAX).optional(), isCover: z.literal(true, { error: 'Set isCover to true to make this the cover.' }).optional() });
export const PhotoOrderSchema = z.object({ photoIds: z.array(z.number().int().positive()).min(1, { error: 'Send the photo ids in their new order.' }) });

// Dyno runs
export const CORRECTION_STANDARDS = ['SAE J1349', 'DIN 70020', 'SAE J607', 'uncorrected'] as const;
const { rpm: RPM, power: POWER, torque: TORQUE } = DYNO_POINT_LIMITS;
export const DynoPointSchema = z.object({
  rpm: boundedNumber('Curve rpm', RPM.min, RPM.max),
  power: boundedNumber('Curve power', POWER.min, POWER.max),
  torque: boundedNumber('Curve torque', TORQUE.min, TORQUE.max),
});
/** The four peak boxes: their labels in the form, and what an empty one asks for. */
export const DYNO_PEAK_FIELDS = {
  peakPower: { label: 'Peak power', missing: 'Enter the peak power.' },
  peakPowerRpm: { label: 'Rpm at peak power', missing: 'Enter the rpm at peak power.' },
  peakTorque: { label: 'Peak torque', missing: 'Enter the peak torque.' },
  peakTorqueRpm: { label: 'Rpm at peak torque', missing: 'Enter the rpm at peak torque.' },
} as const satisfies Record<keyof CurvePeaks, { label: string; missing: string }>;
const peak = (field: keyof CurvePeaks, { min, max }: { min: number; max: number }, opts: { int?: boolean } = {}) => boundedNumber(DYNO_PEAK_FIELDS[field].label, min, max, opts).optional();
export const DynoRunCreateSchema = z
  .object({
    date: calendarDate('Date'),
    facility: shortText('Facility', 120).optional(),
    standard: z.enum(CORRECTION_STANDARDS, { error: `Correction standard must be one of ${CORRECTION_STANDARDS.join(', ')}.` }),
    measuredAt: z.enum(['wheel', 'flywheel'], { error: 'Say whether the dyno measured at the wheels or the flywheel.' }),
    powerUnit: z.enum(['hp', 'PS', 'kW'], { error: 'Power unit must be hp, PS or kW.' }),
    torqueUnit: z.enum(['lbft', 'Nm'], { error: 'Torque unit must be lbft or Nm.' }),
    /** Each peak may be left out when a curve is given: it is then read from the curve. */
    peakPower: peak('peakPower', DYNO_PEAK_LIMITS.power),
    peakPowerRpm: peak('peakPowerRpm', DYNO_PEAK_LIMITS.rpm, { int: true }),
    peakTorque: peak('peakTorque', DYNO_PEAK_LIMITS.torque),
    peakTorqueRpm: peak('peakTorqueRpm', DYNO_PEAK_LIMITS.rpm, { int: true }),
    curve: z.array(DynoPointSchema).max(400, { error: 'At most 400 curve points.' }).default([]),
    /** The curve pasted as CSV, instead of `curve`. */
    curveCsv: text('Pasted curve').max(40_000, { error: 'The pasted curve is too long.' }).optional(),
    sheetPhotoId: z.number().int().positive().optional(),
    note: shortText('Note', 500).optional(),
  })
  .transform(({ curveCsv, ...given }, ctx) => {
    let curve = given.curve;
    if (curveCsv !== undefined && curveCsv.trim() !== '') {
      // The same reader (limits, line numbers, sorting) the form's preview uses.
      const parsed = dynoCurveFromCsv(curveCsv, given);
      if (!parsed.ok) {
        ctx.addIssue({ code: 'custom', path: ['curveCsv'], message: parsed.message });
        return z.NEVER;
      }
      const points = DynoPointSchema.array().max(400, { error: 'At most 400 curve points.' }).safeParse(parsed.points);
      if (!points.success) {
        ctx.addIssue({ code: 'custom', path: ['curveCsv'], message: points.error.issues[0]!.message });
        return z.NEVER;
      }
      curve = points.data;
    }
    const fromCurve = curvePeaks(curve);
    const peaks = {} as CurvePeaks;
    for (const field of Object.keys(DYNO_PEAK_FIELDS) as (keyof CurvePeaks)[]) {
      const value = given[field] ?? fromCurve?.[field];
      if (value === undefined) ctx.addIssue({ code: 'custom', path: [field], message: DYNO_PEAK_FIELDS[field].missing });
      else peaks[field] = value;
    }
    if (Object.keys(peaks).length < 4) return z.NEVER;
    return { ...given, ...peaks, curve };
  })
  .superRefine((run, ctx) => {
    for (let i = 1; i < run.curve.length; i++) {
      if (run.curve[i]!.rpm <= run.curve[i - 1]!.rpm) {
        ctx.addIssue({ code: 'custom', path: ['curve', i, 'rpm'], message: 'Curve rpm must rise from one row to the next.' });
        break;
      }
    }
  });
export type DynoRunCreateInput = z.infer<typeof DynoRunCreateSchema>;
export type DynoRun = DynoRunCreateInput & { id: number; createdAt: string };
export type DynoRunFormInput = z.input<typeof DynoRunCreateSchema>;

// Weigh-ins
export const FUEL_LEVELS = ['empty', 'quarter', 'half', 'three-quarters', 'full'] as const;
/**
 * The tilted reading of a weigh-in, for the centre-of-gravity height: one axle raised by
 * `raisedHeightMm` (at its wheel centres), the two scales still under the other axle read again,
 * in the weigh-in's unit. The level reading is the weigh-in's own corners.
 */
export const WeighInTiltSchema = z.object({
  raisedAxle: z.enum(['front', 'rear'], { error: 'Choose which axle was raised.' }),
  raisedHeightMm: plainMm(MM_RANGES.tiltRaise),
  wheelCentreHeightMm: plainMm(MM_RANGES.wheelCentreHeight),
  leftRaised: boundedNumber('Left scale, other axle raised', 10, 5000),
  rightRaised: boundedNumber('Right scale, other axle raised', 10, 5000),
});
export type WeighInTilt = z.infer<typeof WeighInTiltSchema>;

export const WeighInCreateSchema = z
  .object({
    date: calendarDate('Date'),
    unit: z.enum(['kg', 'lb'], { error: 'Unit must be kg or lb.' }),
    leftFront: boundedNumber('Left front', 10, 5000),
    rightFront: boundedNumber('Right front', 10, 5000),
    leftRear: boundedNumber('Left rear', 10, 5000),
    rightRear: boundedNumber('Right rear', 10, 5000),
    withDriver: z.boolean({ error: 'Say whether the driver was in the car.' }),
    fuelLevel: z.enum(FUEL_LEVELS, { error: 'Choose a fuel level.' }),
    note: shortText('Note', 500).optional(),
    tilt: WeighInTiltSchema.optional(),
  })
  .superRefine((w, ctx) => {
    const t = w.tilt;
    if (!t) return;
    const total = w.leftFront + w.rightFront + w.leftRear + w.rightRear;
    if (t.leftRaised + t.rightRaised > total) {
      ctx.addIssue({ code: 'custom', path: ['tilt', 'leftRaised'], message: `The two scales under the ${t.raisedAxle === 'front' ? 'rear' : 'front'} axle cannot read more together than the whole car (${total} ${w.unit}).` });
    }
  });
export type WeighInCreateInput = z.infer<typeof WeighInCreateSchema>;
export type WeighIn = WeighInCreateInput & { id: number; createdAt: string };

/** "estimated 1,250 kg → measured 1,287 kg on …": a figure's earlier value, kept when it changes. */
export type FigureChange = { id: number; path: string; before: FigureInput; after: FigureInput | null; changedAt: string };

export type BuildOverview = z.infer<typeof BuildOverviewSchema>;

/** The owner's whole build, as the editor loads it. */
export type OwnerBuild = {
  id: number;
  code: string;
  published: boolean;
  overview: BuildOverview;
  /** Present only for someone the build policy lets see private fields (`abilities.viewPrivate`). */
  private?: BuildPrivate;
  sections: Sections;
  sectionsUpdatedAt: Partial<Record<SectionKind, string>>;
  credits: Credit[];
  photos: Photo[];
  dynoRuns: DynoRun[];
  weighIns: WeighIn[];
  history: FigureChange[];
  publicUrl: string;
  updatedAt: string;
  abilities: { viewPrivate: boolean; edit: boolean; delete: boolean; publish: boolean };
};

/** A row in "My builds". */
export type BuildSummary = {
  id: number;
  code: string;
  title: string;
  modelYear: number | null;
  style: string | null;
  published: boolean;
  cover: Photo | null;
  keyFigures: { power?: FigureInput & { at: 'wheel' | 'flywheel' }; weight?: FigureInput; displacement?: FigureInput };
  updatedAt: string;
};

/** What anyone may see: no private field, no owner e-mail, no ids that reveal more. */
export type PublicBuild = {
  code: string;
  url: string;
  title: string;
  modelYear: number | null;
  bodyOrigin: string | null;
  style: string | null;
  story: string;
  ownerName: string;
  weight: FigureInput | null;
  sections: Sections;
  credits: Credit[];
  photos: Photo[];
  dynoRuns: Omit<DynoRun, 'sheetPhotoId' | 'createdAt' | 'id'>[];
  weighIns: Omit<WeighIn, 'id' | 'createdAt'>[];
  updatedAt: string;
};

/** A published build as a tile in a list (the home page): its public face in a few words. */
export type PublicBuildTile = { code: string; url: string; title: string; modelYear: number | null; style: string | null; cover: Photo | null };
export type PublicBuildTileListResponse = { builds: PublicBuildTile[] };
export const PublicBuildListQuerySchema = z.object({
  limit: z.coerce.number({ error: 'Limit must be a number.' }).int({ error: 'Limit must be a whole number.' }).min(1, { error: 'Limit is at least 1.' }).max(24, { error: 'Limit is at most 24.' }).default(8),
});

/** The public list of builds (`/c`): search by title, narrow by style, one page at a time. */
export const PUBLIC_BUILDS_PER_PAGE = 24;
export const PublicBuildSearchSchema = z.object({
  q: shortText('Search', 80).default(''),
  // An empty choice from the form's "any style" means no narrowing.
  style: z.preprocess((v) => (v === '' ? undefined : v), z.enum(BUILD_STYLES, { error: 'Choose a style from the list.' }).optional()),
  page: z.coerce.number({ error: 'Page must be a number.' }).int({ error: 'Page must be a whole number.' }).min(1, { error: 'Page is at least 1.' }).max(10_000, { error: 'Page is at most 10000.' }).default(1),
});
export type PublicBuildSearch = z.infer<typeof PublicBuildSearchSchema>;
