import { entryKeys, showKeys } from '@client/features/shows/api/show-keys';

/** The show-day screens' cache keys, under the show's own key (refreshing the show refreshes them). */
export const showDayKeys = {
  gateCounts: (eventId: number) => [...showKeys.detail(eventId), 'gate-counts'] as const,
  gateRoster: (eventId: number) => [...showKeys.detail(eventId), 'gate-roster'] as const,
  entryTables: (eventId: number) => [...showKeys.detail(eventId), 'entry-table'] as const,
  // Under the tables' key, so every entry action that refreshes the table refreshes the totals too.
  money: (eventId: number) => [...showDayKeys.entryTables(eventId), 'money'] as const,
  entryTable: <Q extends object>(eventId: number, query: Q) => [...showDayKeys.entryTables(eventId), query] as const,
  cardPrint: (eventId: number, classId: number | null) => [...showKeys.detail(eventId), 'card-prints', classId ?? 'all'] as const,
  entryAudit: (entryId: number) => [...entryKeys.detail(entryId), 'audit'] as const,
};
