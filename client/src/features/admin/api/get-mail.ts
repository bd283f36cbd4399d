import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CaughtMail } from '@shared/schemas/mail';
import { api } from '@client/lib/api';

export const getMail = (id: number) => api<{ mail: CaughtMail }>(`/api/admin/mail/${id}`);
export const mailMessageQueryOptions = (id: number) => queryOptions({ queryKey: ['admin', 'mail', id], queryFn: () => getMail(id) });
export const useMailMessage = (id: number) => useQuery(mailMessageQueryOptions(id));
