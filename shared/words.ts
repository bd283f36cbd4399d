// Words and dates a person reads, in one place, so every screen says them the same way.
import { formatNumber } from './calc/format';
import { formatInZone } from './calc/time-zone';

/** What the menu, the buttons and the sign-up page call making an account: one name everywhere. */
export const MAKE_AN_ACCOUNT = 'Make an account';

/** "1 account", "2 accounts", "1,204 builds". `many` for the irregular plurals ("entries"). */
export function countOf(count: number, one: string, many = `${one}s`): string {
  return `${count.toLocaleString('en-GB')} ${count === 1 ? one : many}`;
}

const pad = (n: number) => String(n).padStart(2, '0');

/**
 * A calendar date the same way on every screen: year-month-day (2026-12-02), which no reader
 * mistakes for day-month or month-day. Timestamps are shown in the reader's own time zone.
 */
export function formatDate(value: string | Date): string {
  const d = typeof value === 'string' ? new Date(value) : value;
  if (Number.isNaN(d.getTime())) return '—';
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}

/** A moment, as a date and a 24-hour time in the reader's time zone: 2026-12-02 14:05. */
export function formatDateTime(value: string | Date): string {
  const d = typeof value === 'string' ? new Date(value) : value;
  if (Number.isNaN(d.getTime())) return '—';
  return `${formatDate(d)} ${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

/** A file size as upload limits are set (1 MB = 1024 × 1024 bytes): "15 MB", "15.5 MB"; whole ones without a decimal. */
export function megabytes(bytes: number): string {
  const value = bytes / (1024 * 1024);
  return `${formatNumber(value, { decimals: Number.isInteger(value) ? 0 : 1 })} MB`;
}

/** "plate", "plate and VIN", "plate, VIN and address": a short list in running English. */
export function listInWords(items: readonly string[]): string {
  if (items.length <= 1) return items[0] ?? '';
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/**
 * Where an entry on the waiting list stands, for the organiser: its place in the queue, or, once a
 * place was offered to it, the offer and its deadline on the show's own clock (what the owner sees too).
 */
export function waitingListWords(entry: { waitingPosition: number | null; offerExpiresAt: string | null }, timeZone: string): string {
  if (entry.offerExpiresAt) {
    const until = formatInZone(entry.offerExpiresAt, timeZone, { weekday: 'short', day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });
    return `Place offered, until ${until}`;
  }
  return entry.waitingPosition ? `#${entry.waitingPosition}` : '';
}
