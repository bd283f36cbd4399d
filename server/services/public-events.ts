import { Op, type Transaction } from 'sequelize';
import { VOTING_STATUSES, votingOpen } from '@shared/schemas/peoples-choice';
import { EventSlugSchema } from '@shared/schemas/event';
import { Build } from '../models/build';
import { Entry } from '../models/entry';
import { Event } from '../models/event';
import { EventClass } from '../models/event-class';
import { findEventBySlug } from './events';
import { listPublicEntries } from './entries';
import { loadPublishedResults } from './published-results';

/** Shows are public once they leave draft. */
const PUBLIC_STATUSES = ['registration_open', 'registration_closed', 'show_day', 'judging', 'results_published', 'archived'] as const;
/** While a show is on, a car's public page names the show it is entered in. */
const ON_STATUSES = ['registration_open', 'registration_closed', 'show_day', 'judging'] as const;

/** The show, its public entry list and its published results, or null for a draft or unknown address. */
export async function loadPublicEvent(slug: string) {
  const parsed = EventSlugSchema.safeParse(slug);
  if (!parsed.success) return null;
  const event = await findEventBySlug(parsed.data);
  if (!event || !(PUBLIC_STATUSES as readonly string[]).includes(event.status)) return null;
  const results = event.status === 'results_published' || event.status === 'archived' ? await loadPublishedResults(event.id) : null;
  return { event, entries: await listPublicEntries(event.id), results };
}

/**
 * The entry that puts a build on a show right now (confirmed or checked in, the earliest show first):
 * the one its public page names, and the one a people's choice vote on that page goes to.
 */
export function entryOnShowNow(code: string, transaction?: Transaction): Promise<Entry | null> {
  return Entry.findOne({
    where: { status: { [Op.in]: ['confirmed', 'checked_in'] }, number: { [Op.ne]: null } },
    include: [
      { model: Build, as: 'build', attributes: ['id'], where: { code, published: true } },
      {
        model: Event,
        as: 'event',
        attributes: ['id', 'name', 'slug', 'startsAt', 'status', 'peoplesChoiceOpenedAt', 'peoplesChoiceClosedAt'],
        where: { status: { [Op.in]: [...ON_STATUSES] } },
      },
      { model: EventClass, as: 'eventClass', attributes: ['name'] },
    ],
    order: [[{ model: Event, as: 'event' }, 'startsAt', 'ASC']],
    transaction,
  });
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
