/** Time zones by IANA name, checked and converted with Intl alone (ECMA-402 DateTimeFormat). */

export function isValidTimeZone(name: string): boolean {
  if (!name || name.length > 64) return false;
  try {
    new Intl.DateTimeFormat('en', { timeZone: name });
    return true;
  } catch {
    return false;
  }
}

function wallClockParts(instant: Date, timeZone: string) {
  const parts = new Intl.DateTimeFormat('en-US', {
    timeZone,
    hourCycle: 'h23',
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    second: '2-digit',
  }).formatToParts(instant);
  const get = (t: string) => Number(parts.find((p) => p.type === t)?.value ?? 0);
  return Date.UTC(get('year'), get('month') - 1, get('day'), get('hour'), get('minute'), get('second'));
}

/** The zone's offset from UTC at that instant, in minutes (east positive). */
export function zoneOffsetMinutes(instant: Date, timeZone: string): number {
  return Math.round((wallClockParts(instant, timeZone) - Math.floor(instant.getTime() / 1000) * 1000) / 60000);
}

/**
 * "2027-06-12T09:00" read as the wall clock in `timeZone` → the instant (ISO, UTC).
 * Two passes settle the offset across a daylight-saving change; a wall time that does not exist
 * (skipped by a spring-forward) lands one hour later, as clocks show it.
 */
export function wallTimeToInstant(local: string, timeZone: string): string {
  const m = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})/.exec(local);
  if (!m) throw new RangeError(`Not a local date and time: ${local}`);
  const asUtc = Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3]), Number(m[4]), Number(m[5]));
  let guess = asUtc - zoneOffsetMinutes(new Date(asUtc), timeZone) * 60000;
  guess = asUtc - zoneOffsetMinutes(new Date(guess), timeZone) * 60000;
  return new Date(guess).toISOString();
}

/** An instant → "2027-06-12T09:00" on the wall clock of `timeZone` (for a datetime-local box). */
export function instantToWallTime(iso: string, timeZone: string): string {
  const ms = wallClockParts(new Date(iso), timeZone);
  return new Date(ms).toISOString().slice(0, 16);
}

/** "Sat 12 June 2027, 09:00" in the show's own zone. */
export function formatInZone(iso: string, timeZone: string, options: Intl.DateTimeFormatOptions = { dateStyle: 'full', timeStyle: 'short' }, locale = 'en-GB'): string {
  return new Intl.DateTimeFormat(locale, { ...options, timeZone }).format(new Date(iso));
}

/**
 * A show's span in its own zone, the day said once when it starts and ends on the same day:
 * "Sat, 5 December 2026, 08:00–16:00", else "Sat, 5 December 2026, 08:00 – Sun, 6 December 2026, 16:00".
 */
export function spanInZone(startIso: string, endIso: string, timeZone: string, month: 'long' | 'short' = 'long'): string {
  const day = (iso: string) => formatInZone(iso, timeZone, { weekday: 'short', day: 'numeric', month, year: 'numeric' });
  const time = (iso: string) => formatInZone(iso, timeZone, { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });
  if (day(startIso) === day(endIso)) return `${day(startIso)}, ${time(startIso)}–${time(endIso)}`;
  return `${day(startIso)}, ${time(startIso)} – ${day(endIso)}, ${time(endIso)}`;
}
