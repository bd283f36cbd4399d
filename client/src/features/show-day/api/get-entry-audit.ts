import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AuditLine } from '@shared/schemas/entry';
import { api } from '@client/lib/api';
import { showDayKeys } from './show-day-keys';

export const getEntryAudit = (entryId: number) => api<{ audit: AuditLine[] }>(`/api/entries/${entryId}/audit`).then((r) => r.audit);
export const entryAuditQueryOptions = (entryId: number) => queryOptions({ queryKey: showDayKeys.entryAudit(entryId), queryFn: () => getEntryAudit(entryId) });
export const useEntryAudit = (entryId: number) => useQuery(entryAuditQueryOptions(entryId));
