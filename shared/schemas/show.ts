import { z } from 'zod';
import { ASKABLE_PRIVATE_FIELDS, EVENT_FEE_MAX_MINOR, EVENT_NAME_MAX_LENGTH, EVENT_ROLES, EVENT_SLUG_MAX_LENGTH, EVENT_STATUSES, EVENT_TEXT_MAX_LENGTH } from '../constants';
import { EVENT_ACTION_NAMES } from '../event-lifecycle';
import { isKnownCurrency } from '../calc/money';
import { isValidTimeZone } from '../calc/time-zone';
import { optionalText, requiredLine } from './text';
import { CapacitySchema, CriterionSchema, EventClassSchema } from './show-classes';

// A show's own fields, its lifecycle steps and how the API answers with a show.

/** The private fields a show asks for on its entry form, each once. */
export const AsksForSchema = z
  .array(z.enum(ASKABLE_PRIVATE_FIELDS, { error: 'A show may ask for the plate, the VIN or the address.' }))
  .max(ASKABLE_PRIVATE_FIELDS.length)
  .refine((v) => new Set(v).size === v.length, { error: 'Ask for each field once.' });

const instant = (label: string) => z.iso.datetime({ offset: true, error: `${label} must be a date and time with its offset (ISO 8601).` });

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
  name: requiredLine('Name', EVENT_NAME_MAX_LENGTH),
  slug: EventSlugSchema,
  venueName: requiredLine('Venue', 200),
  venueAddress: optionalText('Venue address', 400).default(''),
  timeZone: TimeZoneSchema,
  startsAt: instant('Start'),
  endsAt: instant('End'),
  registrationOpensAt: instant('Entries open'),
  registrationClosesAt: instant('Entries close'),
  capacity: CapacitySchema.default(null),
  entryFee: z
    .number({ error: 'Fee must be a whole number of minor units (cents).' })
    .int({ error: 'Fee must be a whole number of minor units (cents).' })
    .min(0, { error: 'Fee cannot be negative.' })
    .max(EVENT_FEE_MAX_MINOR, { error: 'Fee is too large.' }),
  currency: CurrencySchema,
  refundRule: RefundRuleSchema.default({ fullRefundUntil: null, afterwardsPercent: 0 }),
  description: optionalText('Description', EVENT_TEXT_MAX_LENGTH).default(''),
  asksFor: AsksForSchema.default([]),
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
  capacity: CapacitySchema,
  entryFee: eventShape.entryFee,
  currency: eventShape.currency,
  refundRule: RefundRuleSchema,
  description: optionalText('Description', EVENT_TEXT_MAX_LENGTH),
  asksFor: AsksForSchema,
}).partial();
export type EventUpdateInput = z.infer<typeof EventUpdateSchema>;

/** `acknowledgeWarnings`: publishing results while the review warns of something (the organiser saw the warnings). */
export const LifecycleActionSchema = z.object({ action: z.enum(EVENT_ACTION_NAMES as [string, ...string[]], { error: 'Unknown step.' }), acknowledgeWarnings: z.boolean().optional() });
export type LifecycleActionInput = z.infer<typeof LifecycleActionSchema>;

export const EventListQuerySchema = z.object({ open: z.enum(['1']).optional() });

// ---- Responses ----
export const EventStatusSchema = z.enum(EVENT_STATUSES);

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

/** Where and when a show is, what it costs and what its entry form asks for: the same in every answer about a show. */
export const ShowWhenWhereOutSchema = z.object({
  venueName: z.string(),
  timeZone: z.string(),
  startsAt: z.string(),
  endsAt: z.string(),
  registrationOpensAt: z.string(),
  registrationClosesAt: z.string(),
  entryFee: z.number(),
  currency: z.string(),
  /** Private fields the entry form asks for beyond name, e-mail and phone (what is asked, never anyone's answer). */
  asksFor: z.array(z.enum(ASKABLE_PRIVATE_FIELDS)),
});

export const EventSummarySchema = z.object({
  id: z.number(),
  name: z.string(),
  slug: z.string(),
  status: EventStatusSchema,
  ...ShowWhenWhereOutSchema.shape,
  myRoles: z.array(z.enum(EVENT_ROLES)),
  publicUrl: z.string(),
  logo: EventLogoOutSchema.nullable(),
});
export type EventSummary = z.infer<typeof EventSummarySchema>;
