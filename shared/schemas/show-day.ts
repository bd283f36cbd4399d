import { z } from 'zod';
import { lineText, requiredLine, shortText } from './text';
import { ASKABLE_PRIVATE_FIELDS, ENTRY_STATUSES } from '../constants';
import { IdSchema, MAX_INTEGER_COLUMN } from './params';
import { EntryStatusSchema } from './entry';
import { EmailSchema } from './user';
import { CHECK_IN_UNDO_SECONDS, GATE_SYNC_MAX, PAYMENT_STATES, PAYMENT_STATE_LABELS, type PaymentState } from '../gate-phone';

/** The organiser's entries table: one page at a time, sorted and filtered on the server. */
export const ENTRY_TABLE_SORTS = ['number', 'title', 'owner', 'class', 'status', 'created'] as const;
export type EntryTableSort = (typeof ENTRY_TABLE_SORTS)[number];
export const ENTRY_TABLE_PAGE_SIZES = [25, 50, 100] as const;
export const ENTRY_SEARCH_MAX_LENGTH = 80;
export const PAYMENT_NOTE_MAX_LENGTH = 300;

const optionalId = z.preprocess((v) => (v === '' ? undefined : v), IdSchema.optional());

export const EntryTableQuerySchema = z.object({
  page: z.coerce.number({ error: 'Page must be a whole number.' }).int().min(1, { error: 'Page starts at 1.' }).default(1),
  pageSize: z.coerce.number().int().refine((n) => (ENTRY_TABLE_PAGE_SIZES as readonly number[]).includes(n), { error: `Page size is one of ${ENTRY_TABLE_PAGE_SIZES.join(', ')}.` }).default(50),
  sort: z.enum(ENTRY_TABLE_SORTS, { error: `Sort by one of ${ENTRY_TABLE_SORTS.join(', ')}.` }).default('number'),
  dir: z.enum(['asc', 'desc'], { error: 'Direction is asc or desc.' }).default('asc'),
  classId: optionalId,
  status: z.preprocess((v) => (v === '' ? undefined : v), z.enum(ENTRY_STATUSES, { error: 'Unknown status.' }).optional()),
  q: lineText('Search', ENTRY_SEARCH_MAX_LENGTH).optional(),
});
export type EntryTableQuery = z.infer<typeof EntryTableQuerySchema>;
/** The CSV export takes the same filters and sort, without paging. */
export const EntryExportQuerySchema = EntryTableQuerySchema.omit({ page: true, pageSize: true });
export type EntryExportQuery = z.infer<typeof EntryExportQuerySchema>;

export { PAYMENT_STATES, PAYMENT_STATE_LABELS, type PaymentState };

/** Pure: what a person reads in the payment column. A refund the payment service sent is done, not due. */
export function paymentStateOf(e: { feeAmount: number; paidAt: string | Date | null; refundDue: number | null; refundedAt?: string | Date | null; status: string }): PaymentState {
  if (e.refundDue && e.refundDue > 0) return e.refundedAt ? 'refunded' : 'refund_due';
  if (e.paidAt) return 'paid';
  return e.feeAmount === 0 ? 'free' : 'unpaid';
}

/** Why a payment that reached an entry did not simply pay its fee. */
export const PAYMENT_ISSUE_REASONS = ['wrong_amount', 'wrong_currency', 'foreign_checkout', 'paid_twice'] as const;
export type PaymentIssueReason = (typeof PAYMENT_ISSUE_REASONS)[number];
export const PAYMENT_ISSUE_LABELS: Record<PaymentIssueReason, string> = {
  wrong_amount: 'Paid an amount other than the fee',
  wrong_currency: 'Paid in another currency',
  foreign_checkout: 'Paid through a checkout not opened for this entry',
  paid_twice: 'Paid again after it was already paid: refunded in full',
};
/** The short label of the entries table's payment cell. */
export const PAYMENT_ISSUE_SHORT_LABEL = 'Check payment';

/** A refund the payment service sent: how much, when, and its reference (one per payment, ever). */
export const RefundSentSchema = z.object({ amount: z.number(), at: z.string(), ref: z.string() });
export type RefundSent = z.infer<typeof RefundSentSchema>;

export const PaymentIssueRowSchema = z.object({
  id: z.number(),
  reason: z.enum(PAYMENT_ISSUE_REASONS),
  /** What the payment service took, in minor units of its currency (which may not be the fee's). */
  amount: z.number(),
  currency: z.string(),
  checkoutId: z.string(),
  at: z.string(),
  refund: RefundSentSchema.nullable(),
});
export type PaymentIssueRow = z.infer<typeof PaymentIssueRowSchema>;

export const EntryTableRowSchema = z.object({
  id: z.number(),
  number: z.number().nullable(),
  buildId: z.number(),
  buildTitle: z.string(),
  buildCode: z.string(),
  /** From the build sheet: the model year and the body's origin (make and model), as the owner wrote them. */
  modelYear: z.number().nullable(),
  bodyOrigin: z.string().nullable(),
  ownerName: z.string(),
  classId: z.number(),
  className: z.string(),
  status: EntryStatusSchema,
  payment: z.enum(PAYMENT_STATES),
  feeAmount: z.number(),
  paidAmount: z.number().nullable(),
  refundDue: z.number().nullable(),
  /** The entry's refund once the payment service sent it; null while due (or for cash, the organiser's to hand back). */
  refund: RefundSentSchema.nullable(),
  /** Payments of this entry that need the organiser's attention, oldest first. */
  paymentIssues: z.array(PaymentIssueRowSchema),
  currency: z.string(),
  paymentRef: z.string().nullable(),
  checkedInAt: z.string().nullable(),
  waitingPosition: z.number().nullable(),
  /** While a freed place is offered to this waiting entry: when the offer lapses (the owner sees the same deadline). */
  offerExpiresAt: z.string().nullable(),
  createdAt: z.string(),
  /** Only for the show's organisers: needed to reach the entrant on the day. */
  contact: z.object({ email: z.string(), phone: z.string().nullable() }),
  /** The build's private fields, organisers only. */
  privateFields: z.object({ vin: z.string().nullable(), plate: z.string().nullable(), address: z.string().nullable() }),
  /** What the entrant agreed to share when entering (the fields the show asked for then). */
  sharedFields: z.array(z.enum(ASKABLE_PRIVATE_FIELDS)),
});
export type EntryTableRow = z.infer<typeof EntryTableRowSchema>;
export const EntryTablePageSchema = z.object({ rows: z.array(EntryTableRowSchema), total: z.number(), page: z.number(), pageSize: z.number(), pageCount: z.number() });
export type EntryTablePage = z.infer<typeof EntryTablePageSchema>;

export const ChangeClassSchema = z.object({ classId: z.number({ error: 'Pick a class.' }).int().positive({ error: 'Pick a class.' }) });
export type ChangeClassInput = z.infer<typeof ChangeClassSchema>;
export const MarkPaidSchema = z.object({
  note: shortText('Payment note', PAYMENT_NOTE_MAX_LENGTH).min(1, { error: 'Say how it was paid (a note).' }),
});
export type MarkPaidInput = z.infer<typeof MarkPaidSchema>;

// ---- The gate ----

/** What was scanned or typed: a card's QR (its /c/<code> URL or the bare code) or an entry number. */
export const GateLookupQuerySchema = z
  .object({
    code: lineText('Code', 300).optional(),
    number: z.coerce.number({ error: 'Entry number is a whole number.' }).int({ error: 'Entry number is a whole number.' }).positive({ error: 'Entry number is a whole number.' }).max(99999).optional(),
  })
  .refine((v) => v.code !== undefined || v.number !== undefined, { error: 'Scan a card or type an entry number.', path: ['number'] });
export type GateLookupQuery = z.infer<typeof GateLookupQuerySchema>;

export const GateCheckInSchema = z.object({
  number: z.number({ error: 'Entry number is required.' }).int().positive(),
  takeCash: z.boolean().default(false),
});
export type GateCheckInInput = z.infer<typeof GateCheckInSchema>;
/** `/events/:id/gate/cards/:number`: the show and the entry number whose card to print. */
export const GateCardParamsSchema = z.object({ id: IdSchema, number: z.coerce.number().int().positive().max(99999) });
export const GateUndoSchema = z.object({ entryId: z.number({ error: 'Which entry?' }).int().positive() });

export { CHECK_IN_UNDO_SECONDS };

export const GATE_PROBLEMS = ['unknown_code', 'not_entered', 'other_show', 'unpaid', 'withdrawn', 'waiting_list', 'already_checked_in'] as const;
export type GateProblem = (typeof GATE_PROBLEMS)[number];

export const GateCardSchema = z.object({
  /** Null when nothing of this show matched (unknown code, a build not entered, another show). */
  entry: z
    .object({
      id: z.number(),
      number: z.number().nullable(),
      title: z.string(),
      className: z.string(),
      classId: z.number(),
      status: EntryStatusSchema,
      payment: z.enum(PAYMENT_STATES),
      feeAmount: z.number(),
      currency: z.string(),
      checkedInAt: z.string().nullable(),
      cover: z.object({ src: z.string(), width: z.number(), height: z.number() }).nullable(),
    })
    .nullable(),
  problem: z.enum(GATE_PROBLEMS).nullable(),
  /** The problem in words, ready to show. */
  message: z.string().nullable(),
  canCheckIn: z.boolean(),
  canTakeCash: z.boolean(),
});
export type GateCard = z.infer<typeof GateCardSchema>;

/** The gate's copy of the show, kept on the phone so it checks cars in with no signal. Public fields of each entry only. */
export const GateRosterEntrySchema = z.object({
  id: z.number(),
  number: z.number().nullable(),
  buildCode: z.string(),
  title: z.string(),
  classId: z.number(),
  className: z.string(),
  status: EntryStatusSchema,
  payment: z.enum(PAYMENT_STATES),
  feeAmount: z.number(),
  currency: z.string(),
  checkedInAt: z.string().nullable(),
});
export type GateRosterEntry = z.infer<typeof GateRosterEntrySchema>;
export const GateRosterSchema = z.object({
  show: z.object({ id: z.number(), name: z.string(), slug: z.string(), timeZone: z.string(), checkIn: z.boolean() }),
  entries: z.array(GateRosterEntrySchema),
  fetchedAt: z.string(),
});
export type GateRoster = z.infer<typeof GateRosterSchema>;

export { GATE_SYNC_MAX };
/** One check-in a gate phone made with no signal: its own id for it, its count, the number, cash or not, and the phone's clock. */
export const GateQueuedCheckInSchema = z.object({
  clientId: z.uuid({ error: 'Each check-in needs its id.' }),
  // Kept in gate_check_ins.sequence, an integer column: a count past it is refused here, not by the database (a 500).
  sequence: z.number({ error: 'Each check-in needs its place in the phone’s queue.' }).int().positive().max(MAX_INTEGER_COLUMN, { error: 'The phone’s queue count is too large.' }),
  number: z.number().int().positive().max(99999),
  takeCash: z.boolean(),
  at: z.iso.datetime({ offset: true, error: 'The phone’s time is an ISO date.' }),
});
export type GateQueuedCheckIn = z.infer<typeof GateQueuedCheckInSchema>;
export const GateSyncSchema = z.object({
  deviceId: z.uuid({ error: 'The phone’s id is missing.' }),
  checkIns: z.array(GateQueuedCheckInSchema).min(1).max(GATE_SYNC_MAX),
});
export type GateSyncInput = z.infer<typeof GateSyncSchema>;
export const GATE_SYNC_OUTCOMES = ['checked_in', 'already_checked_in', 'refused'] as const;
/** What became of one queued check-in: applied, found checked in already (by another gate: both times), or refused with the reason. */
export const GateSyncResultSchema = z.object({
  clientId: z.string(),
  number: z.number(),
  outcome: z.enum(GATE_SYNC_OUTCOMES),
  /** When the server has the car checked in (the first gate's time when two gates did it). */
  checkedInAt: z.string().nullable(),
  /** This phone's time for its own check-in. */
  at: z.string(),
  cashTaken: z.boolean(),
  message: z.string().nullable(),
});
export type GateSyncResult = z.infer<typeof GateSyncResultSchema>;

/** A walk-up: a car that was not entered, entered at the gate and paid in cash on the spot. */
export const WalkUpSchema = z.object({
  title: requiredLine('The car', 120),
  entrantName: requiredLine('The entrant’s name', 120),
  /** Optional: an empty box is no address. */
  email: z.union([z.literal(''), EmailSchema]).optional(),
  classId: z.number({ error: 'Pick a class.' }).int().positive({ error: 'Pick a class.' }),
});
export type WalkUpInput = z.infer<typeof WalkUpSchema>;

export const GateCountsSchema = z.object({
  classes: z.array(z.object({ classId: z.number(), name: z.string(), arrived: z.number(), expected: z.number() })),
  arrived: z.number(),
  expected: z.number(),
});
export type GateCounts = z.infer<typeof GateCountsSchema>;

/** Audit action names a person reads on the entry's history. */
export const AUDIT_ACTION_LABELS: Record<string, string> = {
  entry_created: 'Entered',
  offer_accepted: 'Took the offered place',
  place_offered: 'Place offered',
  offer_lapsed: 'Offer lapsed',
  withdrawn_by_owner: 'Withdrawn by the entrant',
  withdrawn_by_organiser: 'Withdrawn by an organiser',
  payment_confirmed: 'Paid',
  payment_recorded: 'Payment recorded',
  marked_paid: 'Marked paid by hand',
  class_changed: 'Class changed',
  moved_up: 'Moved up from the waiting list',
  checked_in: 'Checked in',
  check_in_undone: 'Check-in undone',
  checkout_opened: 'Went to pay online',
  refund_sent: 'Refund sent by the payment service',
  payment_needs_attention: 'A payment needs attention',
  checkout_expired: 'Online checkout closed',
  logo_changed: 'Logo changed',
  logo_removed: 'Logo removed',
  result_rules_changed: 'Result rules changed',
  tie_ordered_by_hand: 'Tie ordered by hand',
  tie_order_removed: 'Hand order of a tie removed',
  results_published: 'Results published',
};
export const auditActionLabel = (action: string) => AUDIT_ACTION_LABELS[action] ?? action.replace(/_/g, ' ');
