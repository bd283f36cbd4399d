import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InvitationPreview } from '@shared/schemas/show-people';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const getInvitation = (token: string) => api<{ invitation: InvitationPreview }>(`/api/invitations/${encodeURIComponent(token)}`);
// A spent or unknown link answers 404 at once; asking again would not change that.
export const invitationQueryOptions = (token: string) => queryOptions({ queryKey: showKeys.invitation(token), queryFn: () => getInvitation(token), retry: false });
export const useInvitation = (token: string) => useQuery(invitationQueryOptions(token));
