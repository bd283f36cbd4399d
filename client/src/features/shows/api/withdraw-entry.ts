import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@client/lib/api';
import { entryKeys, showKeys } from './show-keys';

export type WithdrawnEntry = { id: number; status: string; refundDue: number | null; currency: string };

/** The owner withdraws their own entry (show-day/api/withdraw-listed-entry.ts is the organiser's). */
export const withdrawEntry = (entryId: number) => api<{ entry: WithdrawnEntry }>(`/api/entries/${entryId}/withdraw`, { method: 'POST' });

export function useWithdrawEntry() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: withdrawEntry,
    // A place freed may go to the waiting list, and the show's counts change: entries, then shows.
    onSuccess: () => qc.invalidateQueries({ queryKey: entryKeys.all }).then(() => qc.invalidateQueries({ queryKey: showKeys.all })),
  });
}
