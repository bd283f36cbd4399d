import { useMutation } from '@tanstack/react-query';
import { api } from '@client/lib/api';

export const sendUserReset = (id: number) => api<{ sentTo: string }>(`/api/admin/users/${id}/password-reset`, { method: 'POST', body: {} });

export const useSendUserReset = () => useMutation({ mutationFn: sendUserReset });
