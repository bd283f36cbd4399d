import { VOTING_STATUSES, votingOpen } from '@shared/schemas/peoples-choice';
import { EventSlugSchema } from '@shared/schemas/show';
import { findEventBySlug } from '../shows/events';
import { entryOnShowNow, listPublicEntries } from '../entries/entries';
import { loadPublishedResults } from '../results/published-results';

/** Shows are public once they leave draft. */
const PUBLIC_STATUSES = ['registration_open', 'registration_closed', 'show_day', 'judging', 'results_published', 'archived'] as const;

/** The show, its public entry list and its published results, or null for a draft or unknown address. */
export async function loadPublicEvent(slug: string) {
  const parsed = EventSlugSchema.safeParse(slug);
  if (!parsed.success) return null;
  const event = await findEventBySlug(parsed.data);
  if (!event || !(PUBLIC_STATUSES as readonly string[]).includes(event.status)) return null;
  const results = event.status === 'results_published' || event.status === 'archived' ? await loadPublishedResults(event.id) : null;
  return { event, entries: await listPublicEntries(event.id), results };
}

export type ShowSlot = { showName: string; showUrl: string; className?: string; entryNumber: string; votingMayOpen: boolean; vote?: { eventId: number; url: string } };

/** The show a build is entered in right now, for its public page, with the vote while the show's window is open. */
export async function showSlotOfBuild(code: string): Promise<ShowSlot | null> {
  const entry = await entryOnShowNow(code);
  if (!entry?.event) return null;
  const e = entry.event;
  return {
    showName: e.name,
    showUrl: `/e/${e.slug}`,
    className: entry.eventClass?.name,
    entryNumber: String(entry.number),
    // Voting could open at any moment on show day and in judging: browsers must revalidate the page.
    votingMayOpen: VOTING_STATUSES.includes(e.status),
    vote: votingOpen(e) ? { eventId: e.id, url: `/c/${code}/vote` } : undefined,
  };
}
