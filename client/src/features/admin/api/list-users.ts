import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AdminUserListResponse } from '@shared/schemas/user';
import { api } from '@client/lib/api';

export type UserListParams = { q: string; page: number; pageSize: number };

export const listUsers = ({ q, page, pageSize }: UserListParams) =>
  api<AdminUserListResponse>(`/api/admin/users?${new URLSearchParams({ ...(q ? { q } : {}), page: String(page), pageSize: String(pageSize) })}`);

export const usersQueryOptions = (params: UserListParams) =>
  queryOptions({ queryKey: ['admin', 'users', params], queryFn: () => listUsers(params), placeholderData: keepPreviousData });

export const useUsers = (params: UserListParams) => useQuery(usersQueryOptions(params));
