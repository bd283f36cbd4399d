import { createEvent } from 'ics';
import type { PublicEvent } from '@shared/schemas/public-event';

/** The show as an iCalendar file (RFC 5545) made with the `ics` package; times in UTC, the zone named in the text. */
export function eventCalendar(e: PublicEvent): string {
  const { error, value } = createEvent({
    productId: 'placard/shows',
    uid: `show-${e.slug}@placard`,
    title: e.name,
    start: new Date(e.startsAt).getTime(),
    startInputType: 'utc',
    startOutputType: 'utc',
    end: new Date(e.endsAt).getTime(),
    endInputType: 'utc',
    endOutputType: 'utc',
    location: [e.venueName, e.venueAddress].filter(Boolean).join(', '),
    description: [e.description, `Entry fee: ${e.feeText}. Times are for ${e.timeZone}.`].filter(Boolean).join('\n\n'),
    url: e.url,
    status: 'CONFIRMED',
  });
  if (error || !value) throw error ?? new Error('Calendar file could not be made.');
  return value;
}
