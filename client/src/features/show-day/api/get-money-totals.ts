import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MoneyTotals } from '@shared/schemas/money-totals';
import { api } from '@client/lib/api';
import { showDayKeys } from './show-day-keys';

export const getMoneyTotals = (eventId: number) => api<{ money: MoneyTotals }>(`/api/events/${eventId}/money`);
export const moneyTotalsQueryOptions = (eventId: number) => queryOptions({ queryKey: showDayKeys.money(eventId), queryFn: () => getMoneyTotals(eventId) });
export const useMoneyTotals = (eventId: number) => useQuery(moneyTotalsQueryOptions(eventId));
