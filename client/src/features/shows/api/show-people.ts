import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { EventRole } from '@shared/constants';
import type { Invitation, InvitationCreateInput, Member } from '@shared/schemas/show-people';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const peopleQueryKey = showKeys.people;
export const getPeople = (id: number) => api<{ members: Member[]; invitations: Invitation[] }>(`/api/events/${id}/people`);
export const peopleQueryOptions = (id: number) => queryOptions({ queryKey: peopleQueryKey(id), queryFn: () => getPeople(id) });
export const usePeople = (id: number) => useQuery(peopleQueryOptions(id));

export function useInvite(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: InvitationCreateInput) => api<{ invitation: Invitation }>(`/api/events/${id}/invitations`, { method: 'POST', body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: peopleQueryKey(id) }),
  });
}
export function useRevokeInvitation(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: number) => api<void>(`/api/events/${id}/invitations/${invitationId}`, { method: 'DELETE' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: peopleQueryKey(id) }),
  });
}
export function useRemoveMember(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (m: { userId: number; role: EventRole }) => api<void>(`/api/events/${id}/members/${m.userId}/${m.role}`, { method: 'DELETE' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: peopleQueryKey(id) }),
  });
}
