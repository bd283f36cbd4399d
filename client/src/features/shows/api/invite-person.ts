import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Invitation, InvitationCreateInput } from '@shared/schemas/show-people';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const invitePerson = (id: number, input: InvitationCreateInput) => api<{ invitation: Invitation }>(`/api/events/${id}/invitations`, { method: 'POST', body: input });

export function useInvitePerson(id: number) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: (input: InvitationCreateInput) => invitePerson(id, input), onSuccess: () => qc.invalidateQueries({ queryKey: showKeys.people(id) }) });
}
