import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CardSettingsResponse } from '@shared/schemas/card';
import { api } from '@client/lib/api';

export const getCardSettings = (buildId: number) => api<CardSettingsResponse>(`/api/builds/${buildId}/card-settings`);

export const cardSettingsQueryOptions = (buildId: number) =>
  queryOptions({ queryKey: ['builds', buildId, 'card-settings'], queryFn: () => getCardSettings(buildId) });

export const useCardSettings = (buildId: number) => useQuery(cardSettingsQueryOptions(buildId));
