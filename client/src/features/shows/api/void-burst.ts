import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PeoplesChoice, VoidBurstInput } from '@shared/schemas/peoples-choice';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const voidBurst = (eventId: number, input: VoidBurstInput) =>
  api<{ peoplesChoice: PeoplesChoice; voided: number }>(`/api/events/${eventId}/peoples-choice/void-burst`, { method: 'POST', body: input });

export function useVoidBurst(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: VoidBurstInput) => voidBurst(eventId, input),
    onSuccess: (data) => qc.setQueryData(showKeys.peoplesChoice(eventId), { peoplesChoice: data.peoplesChoice }),
  });
}
