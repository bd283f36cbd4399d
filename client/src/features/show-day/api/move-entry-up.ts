import { api } from '@client/lib/api';
import { useEntryAction } from './entry-action';

/** Gives a waiting-list entry a place now, ahead of the list's order. */
export const moveEntryUp = ({ entryId }: { entryId: number }) => api<unknown>(`/api/entries/${entryId}/move-up`, { method: 'POST' });

export const useMoveEntryUp = (eventId: number) => useEntryAction(eventId, moveEntryUp);
