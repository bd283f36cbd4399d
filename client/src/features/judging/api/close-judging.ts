import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { JudgingProgress } from '@shared/schemas/judging';
import { api } from '@client/lib/api';
import { judgingKeys } from './judging-keys';

export const closeJudging = (eventId: number) => api<{ progress: JudgingProgress }>(`/api/events/${eventId}/judging/close`, { method: 'POST' });

export function useCloseJudging(eventId: number) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: () => closeJudging(eventId), onSuccess: (data) => qc.setQueryData(judgingKeys.progress(eventId), data) });
}
