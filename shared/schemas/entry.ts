import { z } from 'zod';
import { ASKABLE_PRIVATE_FIELDS, ENTRY_STATUSES } from '../constants';
import { EventSummarySchema } from './show';

// An owner's entry of a build in a show, and the show's history lines about entries.

export const EntryCreateSchema = z.object({
  buildId: z.number({ error: 'Pick one of your builds.' }).int().positive({ error: 'Pick one of your builds.' }),
  classId: z.number({ error: 'Pick a class.' }).int().positive({ error: 'Pick a class.' }),
  /** The private fields the entrant agrees to share with the show's organisers (those the show asks for). */
  shares: z.array(z.enum(ASKABLE_PRIVATE_FIELDS, { error: 'Share the plate, the VIN or the address.' })).max(ASKABLE_PRIVATE_FIELDS.length).default([]),
});
export type EntryCreateInput = z.infer<typeof EntryCreateSchema>;

// ---- Responses ----
export const EntryStatusSchema = z.enum(ENTRY_STATUSES);

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

export const AuditLineSchema = z.object({ id: z.number(), at: z.string(), who: z.string().nullable(), action: z.string(), entryId: z.number().nullable(), before: z.unknown(), after: z.unknown() });
export type AuditLine = z.infer<typeof AuditLineSchema>;
