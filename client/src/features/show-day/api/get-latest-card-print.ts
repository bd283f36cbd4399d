import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CardPrint } from '@shared/schemas/card-print';
import { api } from '@client/lib/api';
import { showDayKeys } from './show-day-keys';

/** While a print is queued or running the page asks for its progress this often. */
export const CARD_PRINT_POLL_MS = 500;

const filterParam = (classId: number | null) => (classId ? `?classId=${classId}` : '');

/** The newest print for the filter (every class, or one): a reload or a second organiser sees the same job. */
export const getLatestCardPrint = (eventId: number, classId: number | null) =>
  api<{ print: CardPrint | null }>(`/api/events/${eventId}/card-prints/latest${filterParam(classId)}`).then((r) => r.print);

export const latestCardPrintQueryOptions = (eventId: number, classId: number | null) =>
  queryOptions({
    queryKey: showDayKeys.cardPrint(eventId, classId),
    queryFn: () => getLatestCardPrint(eventId, classId),
    // Poll only while the job works; a finished or failed print stays as it is.
    refetchInterval: (q) => (q.state.data && (q.state.data.status === 'queued' || q.state.data.status === 'running') ? CARD_PRINT_POLL_MS : false),
  });

export const useLatestCardPrint = (eventId: number, classId: number | null) => useQuery(latestCardPrintQueryOptions(eventId, classId));
