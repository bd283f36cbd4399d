import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PeoplesChoice } from '@shared/schemas/peoples-choice';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const openVoting = (eventId: number) => api<{ peoplesChoice: PeoplesChoice }>(`/api/events/${eventId}/peoples-choice/open`, { method: 'POST' });

export function useOpenVoting(eventId: number) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: () => openVoting(eventId), onSuccess: (data) => qc.setQueryData(showKeys.peoplesChoice(eventId), data) });
}
