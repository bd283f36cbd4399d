import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { EntryTablePage, EntryTableQuery } from '@shared/schemas/show-day';
import { api } from '@client/lib/api';
import { showDayKeys } from './show-day-keys';

/** The query string the table and the CSV link share (empty filters left out). */
export const entryTableParams = (q: Partial<EntryTableQuery>) =>
  new URLSearchParams(Object.entries(q).filter(([, v]) => v !== undefined && v !== '').map(([k, v]) => [k, String(v)]));

export const listEntryTable = (eventId: number, q: EntryTableQuery) => api<EntryTablePage>(`/api/events/${eventId}/entry-table?${entryTableParams(q)}`);

export const entryTableQueryOptions = (eventId: number, q: EntryTableQuery) =>
  queryOptions({ queryKey: showDayKeys.entryTable(eventId, q), queryFn: () => listEntryTable(eventId, q), placeholderData: keepPreviousData });

export const useEntryTable = (eventId: number, q: EntryTableQuery) => useQuery(entryTableQueryOptions(eventId, q));
