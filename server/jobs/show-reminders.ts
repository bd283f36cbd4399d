import { formatInZone } from '@shared/calc/time-zone';
import { showReminderEmail } from '@templates/email/show-reminder';
import { config } from '../config';
import { logger } from '../logger';
import { mailAlreadyQueued, queueMail } from '../mail/outbox';
import { Event } from '../models/event';
import { presentPublicBuild } from '../presenters/public-build';
import { entryCardBuild, entryCardFileName, entryCardShow, reminderEntries, renderEntryCard } from '../services/entries/entry-card';
import { reminderDedupeKey, type ShowReminderJob } from '../services/show-day/show-reminders';
import { CARD_QUEUE, jobQueue } from './queue';

export type { ShowReminderJob };

/**
 * The show reminder, one mail per confirmed entry with the owner's card attached (their own design,
 * with the show, class and number). The card is drawn from the public face of the build only.
 * A retried job sends nothing twice: each mail carries a dedupe key. A worker told to stop (`handBack`)
 * puts the rest back on the queue, and whichever worker takes it skips those already reminded.
 */
export async function sendShowReminders(eventId: number, handBack?: AbortSignal): Promise<void> {
  const event = await Event.findByPk(eventId);
  if (!event) return;
  const when = formatInZone(event.startsAt.toISOString(), event.timeZone, { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric', hour: '2-digit', minute: '2-digit', timeZoneName: 'short' });
  for (const entry of await reminderEntries(eventId)) {
    if (handBack?.aborted) {
      await jobQueue().send(CARD_QUEUE, { kind: 'reminders', eventId } satisfies ShowReminderJob);
      logger.warn({ eventId }, 'stopping: the show reminders not yet sent are back on the queue');
      return;
    }
    if (!entry.owner?.email) continue;
    // Already reminded (a second press, a retried job): skip before spending a card render on it.
    if (await mailAlreadyQueued(reminderDedupeKey(eventId, entry.id))) continue;
    const build = await entryCardBuild(entry);
    const show = await entryCardShow(entry);
    const pdf = await renderEntryCard(build, presentPublicBuild(build), show);
    const mail = showReminderEmail({ name: entry.owner.name, showName: event.name, when, venue: event.venueName, buildTitle: build.title, className: show.className ?? '', number: entry.number!, link: `${config.publicBaseUrl}/entries` });
    const sent = await queueMail(
      { to: entry.owner.email, ...mail, attachments: [{ filename: entryCardFileName(build.code, entry.number!), contentType: 'application/pdf', content: pdf }] },
      { dedupeKey: reminderDedupeKey(eventId, entry.id) },
    );
    if (!sent) logger.info({ entryId: entry.id }, 'show reminder already sent for this entry');
  }
}
