import { formatInZone } from '@shared/calc/time-zone';

/** "Sat 12 Jun 2027, 09:00" on the show's own clock. */
export const showTime = (iso: string, timeZone: string) =>
  formatInZone(iso, timeZone, { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });

export const showDay = (iso: string, timeZone: string) => formatInZone(iso, timeZone, { weekday: 'short', day: 'numeric', month: 'long', year: 'numeric' });
