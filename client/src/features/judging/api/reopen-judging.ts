import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { JudgingProgress } from '@shared/schemas/judging';
import { api } from '@client/lib/api';
import { judgingKeys } from './judging-keys';

export const reopenJudging = (eventId: number) => api<{ progress: JudgingProgress }>(`/api/events/${eventId}/judging/reopen`, { method: 'POST' });

export function useReopenJudging(eventId: number) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: () => reopenJudging(eventId), onSuccess: (data) => qc.setQueryData(judgingKeys.progress(eventId), data) });
}
