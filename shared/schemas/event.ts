import { z } from 'zod';
import {
  CLASSES_PER_EVENT_MAX,
  CRITERIA_PER_EVENT_MAX,
  CRITERION_MAX_POINTS_MAX,
  ENTRY_STATUSES,
  EVENT_CAPACITY_MAX,
  EVENT_FEE_MAX_MINOR,
  EVENT_NAME_MAX_LENGTH,
  EVENT_ROLES,
  EVENT_SLUG_MAX_LENGTH,
  EVENT_STATUSES,
  EVENT_TEXT_MAX_LENGTH,
} from '../constants';
import { EVENT_ACTION_NAMES } from '../event-lifecycle';
import { isKnownCurrency } from '../calc/money';
import { isValidTimeZone } from '../calc/time-zone';
import { EmailSchema } from './user';

const text = (label: string, max: number) =>
  z
    .string({ error: `${label} is required.` })
    .trim()
    .min(1, { error: `${label} is required.` })
    .max(max, { error: `${label} must be at most ${max} characters.` });
const optionalText = (label: string, max: number) => z.string().trim().max(max, { error: `${label} must be at most ${max} characters.` });
const instant = (label: string) => z.iso.datetime({ offset: true, error: `${label} must be a date and time with its offset (ISO 8601).` });
const capacity = z
  .number({ error: 'Capacity must be a whole number or empty.' })
  .int({ error: 'Capacity must be a whole number.' })
  .min(1, { error: 'Capacity must be at least 1, or empty for no limit.' })
  .max(EVENT_CAPACITY_MAX, { error: `Capacity must be at most ${EVENT_CAPACITY_MAX}.` })
  .nullable();

export const EventSlugSchema = z
  .string({ error: 'Address is required.' })
  .trim()
  .toLowerCase()
  .min(3, { error: 'Address must be at least 3 characters.' })
  .max(EVENT_SLUG_MAX_LENGTH, { error: `Address must be at most ${EVENT_SLUG_MAX_LENGTH} characters.` })
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, { error: 'Address uses lowercase letters, digits and single hyphens.' });

export const TimeZoneSchema = z.string({ error: 'Time zone is required.' }).refine(isValidTimeZone, { error: 'Time zone must be an IANA name such as Europe/Berlin.' });
export const CurrencySchema = z
  .string({ error: 'Currency is required.' })
  .trim()
  .toUpperCase()
  .refine(isKnownCurrency, { error: 'Currency must be an ISO 4217 code such as USD or EUR.' });

export const RefundRuleSchema = z.object({
  fullRefundUntil: instant('Full refund until').nullable(),
  afterwardsPercent: z.number({ error: 'Refund after that date must be a percentage.' }).int({ error: 'Use a whole percentage.' }).min(0).max(100, { error: 'At most 100 %.' }),
});

const eventShape = {
  name: text('Name', EVENT_NAME_MAX_LENGTH),
  slug: EventSlugSchema,
  venueName: text('Venue', 200),
  venueAddress: optionalText('Venue address', 400).default(''),
  timeZone: TimeZoneSchema,
  startsAt: instant('Start'),
  endsAt: instant('End'),
  registrationOpensAt: instant('Entries open'),
  registrationClosesAt: instant('Entries close'),
  capacity: capacity.default(null),
  entryFee: z
    .number({ error: 'Fee must be a whole number of minor units (cents).' })
    .int({ error: 'Fee must be a whole number of minor units (cents).' })
    .min(0, { error: 'Fee cannot be negative.' })
    .max(EVENT_FEE_MAX_MINOR, { error: 'Fee is too large.' }),
  currency: CurrencySchema,
  refundRule: RefundRuleSchema.default({ fullRefundUntil: null, afterwardsPercent: 0 }),
  description: optionalText('Description', EVENT_TEXT_MAX_LENGTH).default(''),
};
export const EventFieldsSchema = z.object(eventShape);
export type EventFields = z.infer<typeof EventFieldsSchema>;

type DateFields = Pick<EventFields, 'startsAt' | 'endsAt' | 'registrationOpensAt' | 'registrationClosesAt'>;

/** The date rules between fields, by field name: empty when all hold. Used on create and on every change. */
export function eventDateProblems(v: DateFields): Record<string, string> {
  const t = (s: unknown) => (typeof s === 'string' ? new Date(s).getTime() : NaN);
  const problems: Record<string, string> = {};
  if (t(v.endsAt) <= t(v.startsAt)) problems.endsAt = 'The show must end after it starts.';
  if (t(v.registrationClosesAt) > t(v.startsAt)) problems.registrationClosesAt = 'Entries must close before the show starts.';
  if (t(v.registrationOpensAt) >= t(v.registrationClosesAt)) problems.registrationOpensAt = 'Entries must open before they close.';
  return problems;
}

/** The field checks and the date rules run side by side, so one answer names every problem at once. */
export const EventCreateSchema = z.unknown().transform((raw, ctx): EventFields => {
  const parsed = EventFieldsSchema.safeParse(raw);
  if (!parsed.success) for (const issue of parsed.error.issues) ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
  const dates = raw && typeof raw === 'object' ? eventDateProblems(raw as DateFields) : {};
  for (const [field, message] of Object.entries(dates)) ctx.addIssue({ code: 'custom', path: [field], message });
  return parsed.success && !Object.keys(dates).length ? parsed.data : (z.NEVER as never);
});
export type EventCreateInput = z.infer<typeof EventCreateSchema>;

/** A change names only what changes; the service checks the date rules on the result. */
export const EventUpdateSchema = z.object({
  name: eventShape.name,
  slug: eventShape.slug,
  venueName: eventShape.venueName,
  venueAddress: optionalText('Venue address', 400),
  timeZone: eventShape.timeZone,
  startsAt: eventShape.startsAt,
  endsAt: eventShape.endsAt,
  registrationOpensAt: eventShape.registrationOpensAt,
  registrationClosesAt: eventShape.registrationClosesAt,
  capacity,
  entryFee: eventShape.entryFee,
  currency: eventShape.currency,
  refundRule: RefundRuleSchema,
  description: optionalText('Description', EVENT_TEXT_MAX_LENGTH),
}).partial();
export type EventUpdateInput = z.infer<typeof EventUpdateSchema>;

export const LifecycleActionSchema = z.object({ action: z.enum(EVENT_ACTION_NAMES as [string, ...string[]], { error: 'Unknown step.' }) });
export type LifecycleActionInput = z.infer<typeof LifecycleActionSchema>;

export const ClassInputSchema = z.object({
  name: text('Class name', 80),
  description: optionalText('Description', 1000).default(''),
  position: z.number().int().min(0).max(CLASSES_PER_EVENT_MAX).optional(),
  capacity: capacity.default(null),
});
export type ClassInput = z.infer<typeof ClassInputSchema>;
export const ClassUpdateSchema = z.object({
  name: ClassInputSchema.shape.name,
  description: optionalText('Description', 1000),
  position: z.number().int().min(0).max(CLASSES_PER_EVENT_MAX),
  capacity,
}).partial();
export type ClassUpdateInput = z.infer<typeof ClassUpdateSchema>;

export const CriterionInputSchema = z.object({
  name: text('Criterion', 80),
  maxPoints: z.number({ error: 'Max points must be a whole number.' }).int({ error: 'Max points must be a whole number.' }).min(1, { error: 'At least 1 point.' }).max(CRITERION_MAX_POINTS_MAX),
  weight: z.number({ error: 'Weight must be a number.' }).gt(0, { error: 'Weight must be above 0.' }).max(100, { error: 'Weight must be at most 100.' }),
  tieBreakOrder: z.number().int().min(1).max(CRITERIA_PER_EVENT_MAX).nullable().default(null),
});
export type CriterionInput = z.infer<typeof CriterionInputSchema>;

/** The whole judging sheet at once, in the order it is scored; tie-break places are unique. */
export const JudgingSheetSchema = z
  .object({ criteria: z.array(CriterionInputSchema).max(CRITERIA_PER_EVENT_MAX, { error: `At most ${CRITERIA_PER_EVENT_MAX} criteria.` }) })
  .superRefine((v, ctx) => {
    const seen = new Map<number, number>();
    v.criteria.forEach((c, i) => {
      if (c.tieBreakOrder == null) return;
      if (seen.has(c.tieBreakOrder)) ctx.addIssue({ code: 'custom', path: ['criteria', i, 'tieBreakOrder'], message: 'Two criteria cannot share a tie-break place.' });
      seen.set(c.tieBreakOrder, i);
    });
    const names = new Set<string>();
    v.criteria.forEach((c, i) => {
      const key = c.name.toLowerCase();
      if (names.has(key)) ctx.addIssue({ code: 'custom', path: ['criteria', i, 'name'], message: 'Each criterion needs its own name.' });
      names.add(key);
    });
  });
export type JudgingSheetInput = z.infer<typeof JudgingSheetSchema>;

export const InvitationCreateSchema = z.object({ email: EmailSchema, role: z.enum(EVENT_ROLES, { error: 'Role must be organiser, judge or gate.' }) });
export type InvitationCreateInput = z.infer<typeof InvitationCreateSchema>;
export const InvitationTokenSchema = z.object({ token: z.string({ error: 'The invitation link is incomplete.' }).regex(/^[A-Za-z0-9_-]{20,100}$/, { error: 'The invitation link is not valid.' }) });

export const EntryCreateSchema = z.object({
  buildId: z.number({ error: 'Pick one of your builds.' }).int().positive({ error: 'Pick one of your builds.' }),
  classId: z.number({ error: 'Pick a class.' }).int().positive({ error: 'Pick a class.' }),
});
export type EntryCreateInput = z.infer<typeof EntryCreateSchema>;

export const EventListQuerySchema = z.object({ open: z.enum(['1']).optional() });

// ---- Responses ----
export const EventStatusSchema = z.enum(EVENT_STATUSES);
export const EntryStatusSchema = z.enum(ENTRY_STATUSES);

export const EventClassSchema = z.object({ id: z.number(), name: z.string(), description: z.string(), position: z.number(), capacity: z.number().nullable() });
export type EventClass = z.infer<typeof EventClassSchema>;
export const CriterionSchema = z.object({ id: z.number(), name: z.string(), maxPoints: z.number(), weight: z.number(), tieBreakOrder: z.number().nullable(), position: z.number() });
export type Criterion = z.infer<typeof CriterionSchema>;

export const EventAbilitiesSchema = z.object({
  manage: z.boolean(),
  viewEntries: z.boolean(),
  checkIn: z.boolean(),
  judge: z.boolean(),
  register: z.boolean(),
});
export type EventAbilities = z.infer<typeof EventAbilitiesSchema>;

/** A show's logo as pages show it: one size, WebP with a JPEG fallback. */
export const EventLogoOutSchema = z.object({ webp: z.string(), jpeg: z.string(), width: z.number(), height: z.number() });
export type EventLogoOut = z.infer<typeof EventLogoOutSchema>;

export const EventSchema = EventFieldsSchema.extend({
  id: z.number(),
  status: EventStatusSchema,
  classes: z.array(EventClassSchema),
  criteria: z.array(CriterionSchema),
  myRoles: z.array(z.enum(EVENT_ROLES)),
  abilities: EventAbilitiesSchema,
  publicUrl: z.string(),
  logo: EventLogoOutSchema.nullable(),
});
export type EventDetail = z.infer<typeof EventSchema>;

export const EventSummarySchema = z.object({
  id: z.number(),
  name: z.string(),
  slug: z.string(),
  status: EventStatusSchema,
  venueName: z.string(),
  timeZone: z.string(),
  startsAt: z.string(),
  endsAt: z.string(),
  registrationOpensAt: z.string(),
  registrationClosesAt: z.string(),
  entryFee: z.number(),
  currency: z.string(),
  myRoles: z.array(z.enum(EVENT_ROLES)),
  publicUrl: z.string(),
  logo: EventLogoOutSchema.nullable(),
});
export type EventSummary = z.infer<typeof EventSummarySchema>;

export const EntrySchema = z.object({
  id: z.number(),
  eventId: z.number(),
  buildId: z.number(),
  buildTitle: z.string(),
  buildCode: z.string(),
  classId: z.number(),
  className: z.string(),
  number: z.number().nullable(),
  status: EntryStatusSchema,
  feeAmount: z.number(),
  currency: z.string(),
  paymentRef: z.string().nullable(),
  paidAt: z.string().nullable(),
  refundDue: z.number().nullable(),
  /** When the payment service sent the refund back; null while it is due (or was cash, for the organiser to hand back). */
  refundedAt: z.string().nullable(),
  offerExpiresAt: z.string().nullable(),
  waitingPosition: z.number().nullable(),
  createdAt: z.string(),
});
export type Entry = z.infer<typeof EntrySchema>;
/** The organiser's row adds the entrant's name (never their e-mail in a list that could be shared). */
export const OrganiserEntrySchema = EntrySchema.extend({ ownerName: z.string() });
export type OrganiserEntry = z.infer<typeof OrganiserEntrySchema>;
export const MyEntrySchema = EntrySchema.extend({ event: EventSummarySchema });
export type MyEntry = z.infer<typeof MyEntrySchema>;

export const MemberSchema = z.object({ userId: z.number(), name: z.string(), email: z.string(), role: z.enum(EVENT_ROLES) });
export type Member = z.infer<typeof MemberSchema>;
export const InvitationSchema = z.object({ id: z.number(), email: z.string(), role: z.enum(EVENT_ROLES), expiresAt: z.string(), invitedBy: z.string() });
export type Invitation = z.infer<typeof InvitationSchema>;
export const InvitationPreviewSchema = z.object({ eventName: z.string(), eventSlug: z.string(), role: z.enum(EVENT_ROLES), expiresAt: z.string(), state: z.enum(['open', 'used', 'expired', 'revoked']) });
export type InvitationPreview = z.infer<typeof InvitationPreviewSchema>;

export const AuditLineSchema = z.object({ id: z.number(), at: z.string(), who: z.string().nullable(), action: z.string(), entryId: z.number().nullable(), before: z.unknown(), after: z.unknown() });
export type AuditLine = z.infer<typeof AuditLineSchema>;
