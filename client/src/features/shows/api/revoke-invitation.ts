import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const revokeInvitation = (id: number, invitationId: number) => api<void>(`/api/events/${id}/invitations/${invitationId}`, { method: 'DELETE' });

export function useRevokeInvitation(id: number) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: (invitationId: number) => revokeInvitation(id, invitationId), onSuccess: () => qc.invalidateQueries({ queryKey: showKeys.people(id) }) });
}
