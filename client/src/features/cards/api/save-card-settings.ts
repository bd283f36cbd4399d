import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CardSettings, CardSettingsResponse } from '@shared/schemas/card';
import { api } from '@client/lib/api';
import { cardSettingsQueryOptions } from './get-card-settings';

export const saveCardSettings = ({ buildId, settings }: { buildId: number; settings: CardSettings }) =>
  api<{ settings: CardSettings }>(`/api/builds/${buildId}/card-settings`, { method: 'PUT', body: settings });

export function useSaveCardSettings(buildId: number) {
  const qc = useQueryClient();
  const key = cardSettingsQueryOptions(buildId).queryKey;
  return useMutation({
    mutationFn: saveCardSettings,
    onSuccess: ({ settings }) => qc.setQueryData(key, (old: CardSettingsResponse | undefined) => (old ? { ...old, settings, saved: true } : old)),
  });
}
