import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CaughtMailListResponse } from '@shared/schemas/mail';
import { api } from '@client/lib/api';

export const listMail = () => api<CaughtMailListResponse>('/api/admin/mail');
export const mailQueryOptions = () => queryOptions({ queryKey: ['admin', 'mail'], queryFn: listMail, refetchInterval: 5000 });
export const useMail = () => useQuery(mailQueryOptions());
