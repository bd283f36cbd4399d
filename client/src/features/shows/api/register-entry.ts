import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EntryCreateInput, MyEntry } from '@shared/schemas/entry';
import { api } from '@client/lib/api';
import { entryKeys } from './show-keys';

export const registerEntry = (eventId: number, input: EntryCreateInput) => api<{ entry: MyEntry }>(`/api/events/${eventId}/entries`, { method: 'POST', body: input });

export function useRegisterEntry(eventId: number) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: (input: EntryCreateInput) => registerEntry(eventId, input), onSuccess: () => qc.invalidateQueries({ queryKey: entryKeys.mine() }) });
}
