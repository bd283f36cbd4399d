import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AdminUser } from '@shared/schemas/user';
import { api } from '@client/lib/api';

export const setUserDisabled = ({ id, disabled }: { id: number; disabled: boolean }) =>
  api<{ user: AdminUser }>(`/api/admin/users/${id}/disabled`, { method: 'PUT', body: { disabled } });

export function useSetUserDisabled() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: setUserDisabled, onSuccess: () => qc.invalidateQueries({ queryKey: ['admin', 'users'] }) });
}
