import { QueryTypes } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import { VOTING_STATUSES, votingOpen } from '@shared/schemas/peoples-choice';
import { EventSlugSchema } from '@shared/schemas/show';
import { PUBLIC_EVENT_ENTRIES_PER_PAGE, type PublicEventPageQuery } from '@shared/schemas/public-event';
import { findEventBySlug } from '../shows/events';
import { entriesOnShowNow, listPublicEntries } from '../entries/entries';
import { loadPublishedResults } from '../results/published-results';
import { placesLeftByClass } from '../entries/waitlist';

/** Shows are public once they leave draft. */
const PUBLIC_STATUSES = ['registration_open', 'registration_closed', 'show_day', 'judging', 'results_published', 'archived'] as const;

/** The show (each class with its places left) and its published results, or null for a draft or unknown address. */
async function loadPublicShow(slug: string) {
  const parsed = EventSlugSchema.safeParse(slug);
  if (!parsed.success) return null;
  const event = await findEventBySlug(parsed.data);
  if (!event || !(PUBLIC_STATUSES as readonly string[]).includes(event.status)) return null;
  const classes = event.classes ?? [];
  const left = await placesLeftByClass(event, classes);
  for (const c of classes) c.placesLeft = left.get(c.id) ?? null;
  const results = event.status === 'results_published' || event.status === 'archived' ? await loadPublishedResults(event.id) : null;
  return { event, results };
}

/** The show, its whole public entry list and its published results (the JSON twin), or null for a draft or unknown address. */
export async function loadPublicEvent(slug: string, opts: { entries: boolean } = { entries: true }) {
  const found = await loadPublicShow(slug);
  return found && { ...found, entries: opts.entries ? await listPublicEntries(found.event.id) : [] };
}

/** A car of one page of the show's list, read as plain rows (no model objects: a page is cheap whatever the show's size). */
export type PublicEntryRow = { classId: number; number: number; status: string; buildId: number; title: string; code: string };

// The public list: confirmed or arrived cars with a number, of published builds (as listPublicEntries).
const LISTED = `FROM entries e JOIN builds b ON b.id = e.build_id AND b.published
  WHERE e.event_id = :eventId AND e.status IN ('confirmed', 'checked_in') AND e.number IS NOT NULL`;
// The search is a substring of the title (% and _ typed by a person are plain characters), or the entry number.
const SEARCH = `AND (b.title ILIKE :pattern OR e.number = :number)`;
const likePattern = (q: string) => `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

/**
 * The show and one page of its entry list: the cars of `query.class` (or every class, in the classes'
 * order) whose title holds `query.q` or whose number it is, `PUBLIC_EVENT_ENTRIES_PER_PAGE` at a time.
 * Three statements bounded by the page (LIMIT/OFFSET on the event's index), however many cars the show has.
 */
export async function loadPublicEventPage(slug: string, query: PublicEventPageQuery) {
  const found = await loadPublicShow(slug);
  if (!found) return null;
  const { event } = found;
  const classIds = (event.classes ?? []).map((c) => c.id);
  const unknownClass = query.class !== undefined && !classIds.includes(query.class);
  const number = /^\d{1,9}$/.test(query.q) ? Number(query.q) : -1;
  const replacements = { eventId: event.id, classId: query.class ?? 0, pattern: likePattern(query.q), number };
  const narrowing = `${query.class !== undefined ? 'AND e.class_id = :classId' : ''} ${query.q ? SEARCH : ''}`;
  const counts = await sequelize.query<{ class_id: number; n: string }>(`SELECT e.class_id, count(*) AS n ${LISTED} GROUP BY e.class_id`, { replacements, type: QueryTypes.SELECT });
  const perClass: Record<number, number> = Object.fromEntries(counts.map((r) => [r.class_id, Number(r.n)]));
  const total = unknownClass
    ? 0
    : query.q
      ? Number((await sequelize.query<{ n: string }>(`SELECT count(*) AS n ${LISTED} ${narrowing}`, { replacements, type: QueryTypes.SELECT }))[0]?.n ?? 0)
      : query.class !== undefined
        ? (perClass[query.class] ?? 0)
        : Object.values(perClass).reduce((a, b) => a + b, 0);
  const offset = (query.page - 1) * PUBLIC_EVENT_ENTRIES_PER_PAGE;
  const rows =
    total > offset
      ? await sequelize.query<{ class_id: number; number: number; status: string; build_id: number; title: string; code: string }>(
          `SELECT e.class_id, e.number, e.status, b.id AS build_id, b.title, b.code ${LISTED} ${narrowing}
            ORDER BY array_position(ARRAY[${classIds.map(Number).join(',') || 'NULL'}]::int[], e.class_id), e.number
            LIMIT ${PUBLIC_EVENT_ENTRIES_PER_PAGE} OFFSET ${offset}`,
          { replacements, type: QueryTypes.SELECT },
        )
      : [];
  const entries: PublicEntryRow[] = rows.map((r) => ({ classId: r.class_id, number: r.number, status: r.status, buildId: r.build_id, title: r.title, code: r.code }));
  return { ...found, listing: { perClass, total, pages: Math.max(1, Math.ceil(total / PUBLIC_EVENT_ENTRIES_PER_PAGE)), unknownClass, entries } };
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
