import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Invitation, Member } from '@shared/schemas/show-people';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const listShowPeople = (id: number) => api<{ members: Member[]; invitations: Invitation[] }>(`/api/events/${id}/people`);
export const showPeopleQueryOptions = (id: number) => queryOptions({ queryKey: showKeys.people(id), queryFn: () => listShowPeople(id) });
export const useShowPeople = (id: number) => useQuery(showPeopleQueryOptions(id));
