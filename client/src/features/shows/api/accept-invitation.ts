import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EventRole } from '@shared/constants';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const acceptInvitation = (token: string) => api<{ eventId: number; role: EventRole }>(`/api/invitations/${encodeURIComponent(token)}/accept`, { method: 'POST' });

/** A new role changes which shows the person sees and what they may do in them: every show refetches. */
export function useAcceptInvitation(token: string) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: () => acceptInvitation(token), onSuccess: () => qc.invalidateQueries({ queryKey: showKeys.all }) });
}
