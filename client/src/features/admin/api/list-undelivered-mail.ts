import { useQuery } from '@tanstack/react-query';
import type { UndeliveredMail } from '@shared/schemas/mail';
import { api } from '@client/lib/api';

export const listUndeliveredMail = () => api<{ mail: UndeliveredMail[] }>('/api/admin/undelivered-mail');
export const useUndeliveredMail = () => useQuery({ queryKey: ['admin', 'undelivered-mail'], queryFn: listUndeliveredMail, refetchInterval: 10_000 });
