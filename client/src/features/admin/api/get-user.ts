import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AdminUserDetail } from '@shared/schemas/user';
import { api } from '@client/lib/api';

export const getUser = (id: number) => api<AdminUserDetail>(`/api/admin/users/${id}`);

export const userQueryOptions = (id: number) => queryOptions({ queryKey: ['admin', 'users', 'one', id], queryFn: () => getUser(id) });

export const useUser = (id: number, enabled: boolean) => useQuery({ ...userQueryOptions(id), enabled });
