/** Limits and enums read by both the client and the server. */

export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 200;
export const NAME_MAX_LENGTH = 80;
export const EMAIL_MAX_LENGTH = 254;
/** Hometown and club: public words the owner chooses to show beside their name on results. */
export const HOMETOWN_MAX_LENGTH = 80;
export const CLUB_MAX_LENGTH = 80;

/** A password-reset link works once, for this long. */
export const PASSWORD_RESET_TTL_MINUTES = 60;

/** A link that confirms an e-mail address works once, for this long. */
export const EMAIL_VERIFICATION_TTL_HOURS = 48;
/** New confirmation links a person may ask for per hour (each one is a mail). */
export const EMAIL_VERIFICATION_RESENDS_PER_HOUR = 3;

/** Roles a person can hold for one event (memberships arrive with events). */
export const EVENT_ROLES = ['organiser', 'judge', 'gate'] as const;
export type EventRole = (typeof EVENT_ROLES)[number];

export const PAGE_SIZE_MAX = 100;

/** The life of a show, in order. Each step is an explicit action (see EVENT_ACTIONS). */
export const EVENT_STATUSES = ['draft', 'registration_open', 'registration_closed', 'show_day', 'judging', 'results_published', 'archived'] as const;
export type EventStatus = (typeof EVENT_STATUSES)[number];

/** Plain words for each step, as a person reads them on a screen. */
export const EVENT_STATUS_LABELS: Record<EventStatus, string> = {
  draft: 'Being set up',
  registration_open: 'Taking entries',
  registration_closed: 'Entries closed',
  show_day: 'Show day: gate open',
  judging: 'Judging',
  results_published: 'Results out',
  archived: 'Archived',
};

/** Statuses after which the show is over: its entries no longer hold a build. */
export const EVENT_OVER_STATUSES: readonly EventStatus[] = ['results_published', 'archived'];

/**
 * A build's private fields a show may ask for on its entry form (it always sees the entrant's name,
 * e-mail and phone, which running a show needs); the entrant agrees to share them when entering.
 */
export const ASKABLE_PRIVATE_FIELDS = ['plate', 'vin', 'address'] as const;
export type AskablePrivateField = (typeof ASKABLE_PRIVATE_FIELDS)[number];
export const ASKABLE_PRIVATE_FIELD_LABELS: Record<AskablePrivateField, string> = { plate: 'Plate', vin: 'VIN', address: 'Address' };
/** The same in running text: "your plate and VIN". */
export const ASKABLE_PRIVATE_FIELD_WORDS: Record<AskablePrivateField, string> = { plate: 'plate', vin: 'VIN', address: 'address' };

export const ENTRY_STATUSES = ['awaiting_payment', 'confirmed', 'waiting_list', 'checked_in', 'withdrawn'] as const;
export type EntryStatus = (typeof ENTRY_STATUSES)[number];
export const ENTRY_STATUS_LABELS: Record<EntryStatus, string> = {
  awaiting_payment: 'Awaiting payment',
  confirmed: 'Confirmed',
  waiting_list: 'Waiting list',
  checked_in: 'Checked in',
  withdrawn: 'Withdrawn',
};
/** Entries that hold a place in their class and show (a waiting-list entry holds one only while offered). */
export const ENTRY_PLACE_STATUSES: readonly EntryStatus[] = ['awaiting_payment', 'confirmed', 'checked_in'];

export const EVENT_ROLE_LABELS: Record<EventRole, string> = { organiser: 'Organiser', judge: 'Judge', gate: 'Gate' };

export const EVENT_NAME_MAX_LENGTH = 120;
export const EVENT_TEXT_MAX_LENGTH = 4000;
export const EVENT_SLUG_MAX_LENGTH = 60;
export const EVENT_CAPACITY_MAX = 5000;
/** Largest fee in minor units (100 000.00 in a two-decimal currency). */
export const EVENT_FEE_MAX_MINOR = 10_000_000;
export const CLASSES_PER_EVENT_MAX = 40;
export const CRITERIA_PER_EVENT_MAX = 20;
export const CRITERION_MAX_POINTS_MAX = 1000;
/** An invitation link works once, for this long. */
export const INVITATION_TTL_DAYS = 14;
/** A waiting-list entrant offered a freed place has this long to take it before the next in line is offered. */
export const WAITLIST_OFFER_HOURS = 48;
