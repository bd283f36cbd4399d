import { ConflictError } from '../../errors';
import { CARD_QUEUE, jobQueue } from '../../jobs/queue';
import type { Event } from '../../models/event';
import { reminderEntries } from '../entries/entry-card';

/** Sends every confirmed entrant of a show the reminder with their card; worked by `jobs/show-reminders.ts`. */
export type ShowReminderJob = { kind: 'reminders'; eventId: number };

/**
 * Queues the show reminder for the confirmed entrants (rendering a card each takes a while, so a job
 * does it). Each entry gets it once: a second press sends nothing to those who already have it.
 */
export async function queueShowReminders(event: Event): Promise<{ entrants: number }> {
  const entrants = (await reminderEntries(event.id)).length;
  if (entrants === 0) throw new ConflictError('This show has no confirmed entries yet: nobody to remind.', { entries: 'No confirmed entries.' });
  const job: ShowReminderJob = { kind: 'reminders', eventId: event.id };
  await jobQueue().send(CARD_QUEUE, job);
  return { entrants };
}

/** One reminder per entry, ever (the key is kept with the mail job). */
export const reminderDedupeKey = (eventId: number, entryId: number) => `show-reminder:${eventId}:${entryId}`;
