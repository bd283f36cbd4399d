import { ENTRY_STATUS_LABELS } from './constants';
import { formatMoney } from './calc/money';
import { formatInZone } from './calc/time-zone';

/** What an entry's history line needs to be read: the show's currency and time zone. */
export type AuditWordsContext = { currency: string; timeZone: string };

const MONEY_FIELDS: Record<string, string> = { paidAmount: 'Paid', refundDue: 'Refund due', amount: 'Amount' };
const FIELD_LABELS: Record<string, string> = {
  status: 'Status',
  className: 'Class',
  number: 'Number',
  note: 'Note',
  reason: 'Reason',
  refundRef: 'Refund reference',
  offerExpiresAt: 'Offer open until',
};
const YES_NO_FIELDS: Record<string, string> = { cashTaken: 'Cash taken at the gate', cashReturned: 'Cash handed back' };
// Ids and references to other rows say nothing to a person; the class's name and the amount do.
const HIDDEN = (key: string) => key.endsWith('Id') || key === 'paymentRef' || key === 'paymentIssue' || key === 'currency';

function valueWords(key: string, value: unknown, ctx: AuditWordsContext): string {
  if (value === null || value === undefined || value === '') return '—';
  if (key in MONEY_FIELDS && typeof value === 'number') return formatMoney(value, ctx.currency);
  if (key === 'status' && typeof value === 'string' && value in ENTRY_STATUS_LABELS) return ENTRY_STATUS_LABELS[value as keyof typeof ENTRY_STATUS_LABELS];
  if (key.endsWith('At') && typeof value === 'string') return formatInZone(value, ctx.timeZone, { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });
  return String(value);
}

/** A field name as words when no label is set: "someField" → "Some field". */
const fieldWords = (key: string) => FIELD_LABELS[key] ?? MONEY_FIELDS[key] ?? (key.charAt(0).toUpperCase() + key.slice(1).replace(/([A-Z])/g, ' $1').toLowerCase());

/**
 * An audit line's change in words: "Paid: $30.00", "Class: Customs → Hot rods to 1948". Only fields the
 * line's `after` holds are read (that is what changed); a field unchanged from before is left out.
 */
export function auditChangeWords(before: unknown, after: unknown, ctx: AuditWordsContext): string[] {
  const b = (before ?? {}) as Record<string, unknown>;
  const a = (after ?? {}) as Record<string, unknown>;
  return Object.keys(a)
    .filter((k) => !HIDDEN(k))
    .flatMap((k): string[] => {
      if (k in YES_NO_FIELDS) return a[k] === true ? [YES_NO_FIELDS[k] as string] : [];
      const now = valueWords(k, a[k], ctx);
      const was = k in b ? valueWords(k, b[k], ctx) : '—';
      // Something set where nothing was reads as the new value alone: "Paid: $30.00".
      if (was === '—') return now === '—' ? [] : [`${fieldWords(k)}: ${now}`];
      if (was === now) return [];
      return [`${fieldWords(k)}: ${was} → ${now}`];
    });
}

/** When a history line happened, in the show's time zone: "4 Dec, 14:05". */
export const auditTimeWords = (iso: string, timeZone: string) => formatInZone(iso, timeZone, { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });
