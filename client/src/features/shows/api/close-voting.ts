import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PeoplesChoice } from '@shared/schemas/peoples-choice';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const closeVoting = (eventId: number) => api<{ peoplesChoice: PeoplesChoice }>(`/api/events/${eventId}/peoples-choice/close`, { method: 'POST' });

export function useCloseVoting(eventId: number) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: () => closeVoting(eventId), onSuccess: (data) => qc.setQueryData(showKeys.peoplesChoice(eventId), data) });
}
