import type { EventAction } from '@shared/event-lifecycle';
import { withTransaction } from '../../db/transaction';
import { takeLifecycleStepIn } from '../shows/events';
import { publishResults } from '../results/results-publishing';

/**
 * A step of the show's life. Publishing results stores and mails them in the step's transaction, with
 * the show row locked, so they are published exactly when the step is taken and no score slips in;
 * with warnings standing (a scored car that never arrived, an arrived car with no finished sheet) only
 * when the organiser acknowledged them.
 */
export async function takeLifecycleStep(eventId: number, person: { id: number }, action: EventAction, options: { acknowledgeWarnings?: boolean | undefined } = {}): Promise<void> {
  await withTransaction(undefined, async (transaction) => {
    await takeLifecycleStepIn(eventId, person, action, transaction);
    if (action === 'publish_results') await publishResults(eventId, person, transaction, options);
  });
}
