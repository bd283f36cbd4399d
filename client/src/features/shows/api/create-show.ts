import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EventCreateInput, EventDetail } from '@shared/schemas/show';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const createShow = (input: EventCreateInput) => api<{ event: EventDetail }>('/api/events', { method: 'POST', body: input });
export function useCreateShow() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createShow, onSuccess: () => qc.invalidateQueries({ queryKey: showKeys.mine() }) });
}
