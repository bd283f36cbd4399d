import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EventDetail } from '@shared/schemas/show';
import { showKeys } from './show-keys';

/** A change to a show whose answer is the whole show: put straight into the cache. */
export function useShowMutation<I>(id: number, send: (input: I) => Promise<{ event: EventDetail }>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: (data) => {
      qc.setQueryData(showKeys.detail(id), data);
      void qc.invalidateQueries({ queryKey: showKeys.mine() });
    },
  });
}
