import { listMyShows } from './list-my-shows';

/** Where a sign-in with no `next` lands: people with a role in a show land on their shows, owners on My builds. */
export async function landingAfterSignIn(): Promise<string> {
  const { events } = await listMyShows().catch(() => ({ events: [] }));
  return events.length ? '/shows' : '/builds';
}
