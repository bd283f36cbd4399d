import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PeoplesChoice, VoidAddressInput } from '@shared/schemas/peoples-choice';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const voidAddress = (eventId: number, input: VoidAddressInput) =>
  api<{ peoplesChoice: PeoplesChoice; voided: number }>(`/api/events/${eventId}/peoples-choice/void`, { method: 'POST', body: input });

export function useVoidAddress(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: VoidAddressInput) => voidAddress(eventId, input),
    onSuccess: (data) => qc.setQueryData(showKeys.peoplesChoice(eventId), { peoplesChoice: data.peoplesChoice }),
  });
}
