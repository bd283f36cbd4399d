import type { EventSummary } from '@shared/schemas/show';

/** The statuses in which a show is on the field today: its people land on their day's work. */
const ON_THE_DAY = new Set(['show_day', 'judging']);

/**
 * Where a person's day starts: an organiser of a show on the field on its dashboard (the show page,
 * "Today" on top), gate staff on the scanner (of the show whose gate is open, when one is), a judge of a show being judged on their cars; a site
 * admin with none of these on the accounts page; anyone else with a show role on their shows, owners on
 * My builds. Organising outranks the gate, the gate outranks judging, when one person holds several.
 */
export function landingFor(shows: EventSummary[], person: { isSiteAdmin: boolean }): string {
  const today = shows.filter((s) => ON_THE_DAY.has(s.status));
  const holding = (role: EventSummary['myRoles'][number], status?: string) => today.find((s) => s.myRoles.includes(role) && (!status || s.status === status));
  const organising = holding('organiser');
  if (organising) return `/shows/${organising.id}`;
  // A show whose gate is open before one being judged, where only a late car may still come.
  const gate = holding('gate', 'show_day') ?? holding('gate');
  if (gate) return `/gate/${gate.id}`;
  const judging = holding('judge', 'judging');
  if (judging) return `/judge/${judging.id}`;
  if (person.isSiteAdmin) return '/admin/accounts';
  return shows.length ? '/shows' : '/builds';
}
