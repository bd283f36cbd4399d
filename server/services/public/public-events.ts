import { QueryTypes } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { VOTING_STATUSES, votingOpen } from '@shared/schemas/peoples-choice';
import { EventSlugSchema } from '@shared/schemas/show';
import { findEventBySlug } from '../shows/events';
import { entriesOnShowNow, listPublicEntries } from '../entries/entries';
import { loadPublishedResults } from '../results/published-results';
import { placesLeftByClass } from '../entries/waitlist';

/** Shows are public once they leave draft. */
const PUBLIC_STATUSES = ['registration_open', 'registration_closed', 'show_day', 'judging', 'results_published', 'archived'] as const;

/** The show (each class with its places left), its public entry list and its published results, or null for a draft or unknown address. */
export async function loadPublicEvent(slug: string) {
  const parsed = EventSlugSchema.safeParse(slug);
  if (!parsed.success) return null;
  const event = await findEventBySlug(parsed.data);
  if (!event || !(PUBLIC_STATUSES as readonly string[]).includes(event.status)) return null;
  const classes = event.classes ?? [];
  const left = await placesLeftByClass(event, classes);
  for (const c of classes) c.placesLeft = left.get(c.id) ?? null;
  const results = event.status === 'results_published' || event.status === 'archived' ? await loadPublishedResults(event.id) : null;
  return { event, entries: await listPublicEntries(event.id), results };
}

export type ShowSlot = {
  eventId: number;
  showSlug: string;
  showName: string;
  showUrl: string;
  className?: string;
  entryNumber: string;
  votingMayOpen: boolean;
  vote?: { eventId: number; url: string };
};

/**
 * Every current show a build is in, for its public page: soonest first, except that `firstSlug` (the show
 * whose card's QR code was scanned) leads. Each has its number, class and, while that show's window is
 * open, its own vote.
 */
export async function showSlotsOfBuild(code: string, firstSlug?: string): Promise<ShowSlot[]> {
  const entries = await entriesOnShowNow(code);
  const slots = entries.flatMap((entry): ShowSlot[] => {
    const e = entry.event;
    if (!e) return [];
    return [
      {
        eventId: e.id,
        showSlug: e.slug,
        showName: e.name,
        showUrl: `/e/${e.slug}`,
        className: entry.eventClass?.name,
        entryNumber: String(entry.number),
        // Voting could open at any moment on show day and in judging: browsers must revalidate the page.
        votingMayOpen: VOTING_STATUSES.includes(e.status),
        vote: votingOpen(e) ? { eventId: e.id, url: voteUrl(code, e.slug) } : undefined,
      },
    ];
  });
  const first = slots.findIndex((s) => s.showSlug === firstSlug);
  return first > 0 ? [slots[first]!, ...slots.slice(0, first), ...slots.slice(first + 1)] : slots;
}

/** Where a vote for this car in this show is posted: the show rides in the address, so two shows' forms never mix. */
export const voteUrl = (code: string, slug: string) => `/c/${code}/vote?show=${encodeURIComponent(slug)}`;

/** The next moment a show starts or stops taking entries by the clock alone (the home page lists those taking them now). */
export async function nextRegistrationChange(now = new Date()): Promise<Date | null> {
  const rows = await sequelize.query<{ at: Date | null }>(
    `SELECT min(t) AS at FROM events, LATERAL (VALUES (registration_opens_at), (registration_closes_at)) v(t)
      WHERE status = 'registration_open' AND t > :now`,
    { replacements: { now }, type: QueryTypes.SELECT },
  );
  return rows[0]?.at ?? null;
}
