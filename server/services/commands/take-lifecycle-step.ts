import type { EventAction } from '@shared/event-lifecycle';
import { withTransaction } from '../../db/transaction';
import { takeLifecycleStepIn } from '../shows/events';
import { publishResults } from '../results/results-publishing';

/**
 * A step of the show's life. Publishing results stores and mails them in the step's transaction, with
 * the show row locked, so they are published exactly when the step is taken and no score slips in.
 */
export async function takeLifecycleStep(eventId: number, person: { id: number }, action: EventAction): Promise<void> {
  await withTransaction(undefined, async (transaction) => {
    await takeLifecycleStepIn(eventId, person, action, transaction);
    if (action === 'publish_results') await publishResults(eventId, person, transaction);
  });
}
