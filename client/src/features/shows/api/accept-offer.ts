import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MyEntry } from '@shared/schemas/entry';
import { api } from '@client/lib/api';
import { entryKeys } from './show-keys';

/** Takes the place offered to a waiting-list entry. */
export const acceptOffer = (entryId: number) => api<{ entry: MyEntry }>(`/api/entries/${entryId}/accept-offer`, { method: 'POST' });

export function useAcceptOffer() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: acceptOffer, onSuccess: () => qc.invalidateQueries({ queryKey: entryKeys.mine() }) });
}
