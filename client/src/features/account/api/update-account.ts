import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AccountUpdateInput, CurrentUser } from '@shared/schemas/user';
import { api } from '@client/lib/api';
import { sessionQueryKey } from '@client/features/session/api/get-session';

export const updateAccount = (input: AccountUpdateInput) => api<{ user: CurrentUser }>('/api/account', { method: 'PATCH', body: input });

export function useUpdateAccount() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: updateAccount, onSuccess: () => qc.invalidateQueries({ queryKey: sessionQueryKey }) });
}
