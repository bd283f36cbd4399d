import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { EventRole } from '@shared/constants';
import type { InvitationPreview } from '@shared/schemas/show-people';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const invitationQueryKey = showKeys.invitation;
export const getInvitation = (token: string) => api<{ invitation: InvitationPreview }>(`/api/invitations/${encodeURIComponent(token)}`);
export const invitationQueryOptions = (token: string) => queryOptions({ queryKey: invitationQueryKey(token), queryFn: () => getInvitation(token), retry: false });
export const useInvitation = (token: string) => useQuery(invitationQueryOptions(token));

export function useAcceptInvitation(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api<{ eventId: number; role: EventRole }>(`/api/invitations/${encodeURIComponent(token)}/accept`, { method: 'POST' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: showKeys.all }),
  });
}
