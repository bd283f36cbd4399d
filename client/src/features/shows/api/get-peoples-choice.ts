import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PeoplesChoice } from '@shared/schemas/peoples-choice';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const getPeoplesChoice = (eventId: number) => api<{ peoplesChoice: PeoplesChoice }>(`/api/events/${eventId}/peoples-choice`);
// Votes arrive while the organiser watches: refresh every 15 s.
export const peoplesChoiceQueryOptions = (eventId: number) => queryOptions({ queryKey: showKeys.peoplesChoice(eventId), queryFn: () => getPeoplesChoice(eventId), refetchInterval: 15_000 });
export const usePeoplesChoice = (eventId: number) => useQuery(peoplesChoiceQueryOptions(eventId));
