import { landingFor } from '../model/landing';
import { listMyShows } from './list-my-shows';

/** Where a sign-in with no `next` lands: each role on its day's work (`landingFor`), owners on My builds. */
export async function landingAfterSignIn(person: { isSiteAdmin: boolean }): Promise<string> {
  const { events } = await listMyShows().catch(() => ({ events: [] }));
  return landingFor(events, person);
}
