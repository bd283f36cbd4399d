import { votingOpen } from '@shared/schemas/peoples-choice';
import { EVENT_STATUS_LABELS, type EventStatus } from '@shared/constants';
import { formatMoney } from '@shared/calc/money';
import type { PublicEntryListing, PublicEvent, PublicEventPageQuery } from '@shared/schemas/public-event';
import { PublicResultsSchema, totalShown, type PublicResults, type ResultsSnapshot, type SnapshotLine } from '@shared/schemas/results';
import { config } from '../config';
import { presentEventLogo } from './event';
import type { Entry } from '../models/entry';
import type { Event } from '../models/event';

/** The allow-list of a show's public face: every field named; entries by number and title only. */
export function presentPublicEvent(event: Event, entries: Entry[], results: ResultsSnapshot | null = null, now = new Date()): PublicEvent {
  const url = `${config.publicBaseUrl}/e/${event.slug}`;
  return {
    id: event.id,
    name: event.name,
    slug: event.slug,
    url,
    calendarUrl: `${url}/calendar.ics`,
    status: event.status,
    statusLabel: EVENT_STATUS_LABELS[event.status as EventStatus],
    logo: presentEventLogo(event.logo),
    asksFor: [...event.asksFor],
    takingEntries: event.status === 'registration_open' && event.registrationOpensAt <= now && now < event.registrationClosesAt,
    peoplesChoiceOpen: votingOpen(event),
    venueName: event.venueName,
    venueAddress: event.venueAddress,
    timeZone: event.timeZone,
    startsAt: event.startsAt.toISOString(),
    endsAt: event.endsAt.toISOString(),
    registrationOpensAt: event.registrationOpensAt.toISOString(),
    registrationClosesAt: event.registrationClosesAt.toISOString(),
    entryFee: event.entryFee,
    currency: event.currency,
    feeText: event.entryFee === 0 ? 'Free' : formatMoney(event.entryFee, event.currency),
    refundRule: { fullRefundUntil: event.refundRule.fullRefundUntil, afterwardsPercent: event.refundRule.afterwardsPercent },
    description: event.description,
    classes: (event.classes ?? []).map((c) => ({
      id: c.id,
      name: c.name,
      description: c.description,
      placesLeft: c.placesLeft ?? null,
      entries: entries
        .filter((e) => e.classId === c.id && e.number !== null && e.build)
        .map((e) => ({ number: e.number!, title: e.build!.title, url: `${config.publicBaseUrl}/c/${e.build!.code}`, ...(e.status === 'checked_in' ? { arrived: true as const } : {}) })),
    })),
    results: results ? presentPublicResults(results) : null,
  };
}

const publicLine = (l: SnapshotLine) => ({ place: l.place, shared: l.shared, number: l.number, title: l.title, url: `${config.publicBaseUrl}/c/${l.code}`, className: l.className, total: totalShown(l.total) });

/** The stored results through the public schema: places, numbers, titles, links and rounded totals; nothing else of the snapshot. */
export function presentPublicResults(r: ResultsSnapshot): PublicResults {
  return PublicResultsSchema.parse({
    publishedAt: r.publishedAt,
    classes: r.classes.map((c) => ({ name: c.className, placings: c.placings.map(publicLine) })),
    bestOfShow: r.bestOfShow.map(publicLine),
    peoplesChoice: (r.peoplesChoice?.winners ?? []).map((l) => ({ ...publicLine(l), total: l.decidedBy })),
  });
}

/** One page of the show's list as the page shows it: class, number, title and the car's address; nothing of the owner. */
export function presentPublicEntryListing(
  query: PublicEventPageQuery,
  listing: { perClass: Record<number, number>; total: number; pages: number; unknownClass: boolean; entries: Array<{ classId: number; number: number; status: string; title: string; code: string }> },
): PublicEntryListing {
  return {
    query,
    perClass: listing.perClass,
    total: listing.total,
    pages: listing.pages,
    unknownClass: listing.unknownClass,
    entries: listing.entries.map((e) => ({ classId: e.classId, number: e.number, title: e.title, url: `${config.publicBaseUrl}/c/${e.code}`, ...(e.status === 'checked_in' ? { arrived: true as const } : {}) })),
  };
}
