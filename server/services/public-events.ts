import { Op } from 'sequelize';
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

/** The show a build is entered in right now (confirmed or checked in), for its public page. */
export async function showSlotOfBuild(code: string) {
  const entry = await Entry.findOne({
    where: { status: { [Op.in]: ['confirmed', 'checked_in'] }, number: { [Op.ne]: null } },
    include: [
      { model: Build, as: 'build', attributes: ['id'], where: { code, published: true } },
      { model: Event, as: 'event', attributes: ['name', 'slug', 'startsAt'], where: { status: { [Op.in]: [...ON_STATUSES] } } },
      { model: EventClass, as: 'eventClass', attributes: ['name'] },
    ],
    order: [[{ model: Event, as: 'event' }, 'startsAt', 'ASC']],
  });
  if (!entry?.event) return null;
  return { showName: entry.event.name, showUrl: `/e/${entry.event.slug}`, className: entry.eventClass?.name, entryNumber: String(entry.number) };
}
