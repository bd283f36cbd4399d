import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PeoplesChoice, VoidAddressInput } from '@shared/schemas/peoples-choice';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

type Answer = { peoplesChoice: PeoplesChoice };

export const getPeoplesChoice = (eventId: number) => api<Answer>(`/api/events/${eventId}/peoples-choice`);
// Votes arrive while the organiser watches: refresh every 15 s.
export const peoplesChoiceQueryOptions = (eventId: number) => queryOptions({ queryKey: showKeys.peoplesChoice(eventId), queryFn: () => getPeoplesChoice(eventId), refetchInterval: 15_000 });
export const usePeoplesChoice = (eventId: number) => useQuery(peoplesChoiceQueryOptions(eventId));

export function useSetVotingWindow(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (open: boolean) => api<Answer>(`/api/events/${eventId}/peoples-choice/${open ? 'open' : 'close'}`, { method: 'POST' }),
    onSuccess: (data) => qc.setQueryData(peoplesChoiceQueryOptions(eventId).queryKey, data),
  });
}

export function useVoidAddress(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: VoidAddressInput) => api<Answer & { voided: number }>(`/api/events/${eventId}/peoples-choice/void`, { method: 'POST', body: input }),
    onSuccess: (data) => qc.setQueryData(peoplesChoiceQueryOptions(eventId).queryKey, { peoplesChoice: data.peoplesChoice }),
  });
}
