import { api } from '@client/lib/api';
import { useEntryAction } from './entry-action';

/**
 * The organiser withdraws an entry from the table. The same endpoint as the owner's own withdrawal
 * (shows/api/withdraw-entry.ts), but what refetches after it is the organiser's table, not the owner's list.
 */
export const withdrawListedEntry = ({ entryId }: { entryId: number }) => api<unknown>(`/api/entries/${entryId}/withdraw`, { method: 'POST' });

export const useWithdrawListedEntry = (eventId: number) => useEntryAction(eventId, withdrawListedEntry);
