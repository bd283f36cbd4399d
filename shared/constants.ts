/** Limits and enums read by both the client and the server. */

export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 200;
export const NAME_MAX_LENGTH = 80;
export const EMAIL_MAX_LENGTH = 254;

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
