import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AdminUser, AdminUserUpdateInput } from '@shared/schemas/user';
import { api } from '@client/lib/api';

export const updateUserRoles = ({ id, ...input }: AdminUserUpdateInput & { id: number }) =>
  api<{ user: AdminUser }>(`/api/admin/users/${id}`, { method: 'PATCH', body: input });

export function useUpdateUserRoles() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: updateUserRoles, onSuccess: () => qc.invalidateQueries({ queryKey: ['admin', 'users'] }) });
}
