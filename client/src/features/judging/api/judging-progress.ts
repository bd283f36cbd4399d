import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { JudgeClassesInput, JudgeSummary, JudgingProgress } from '@shared/schemas/judging';
import { api } from '@client/lib/api';
import { judgingKeys } from './judging-keys';

export const getProgress = (eventId: number) => api<{ progress: JudgingProgress }>(`/api/events/${eventId}/judging/progress`);
export const progressQueryOptions = (eventId: number) => queryOptions({ queryKey: judgingKeys.progress(eventId), queryFn: () => getProgress(eventId), refetchInterval: 20_000 });
export const useProgress = (eventId: number) => useQuery(progressQueryOptions(eventId));

export const listJudges = (eventId: number) => api<{ judges: JudgeSummary[] }>(`/api/events/${eventId}/judges`);
export const judgesQueryOptions = (eventId: number) => queryOptions({ queryKey: judgingKeys.judges(eventId), queryFn: () => listJudges(eventId) });
export const useJudges = (eventId: number) => useQuery(judgesQueryOptions(eventId));

export function useAssignJudge(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ judgeId, input }: { judgeId: number; input: JudgeClassesInput }) => api<{ judges: JudgeSummary[] }>(`/api/events/${eventId}/judges/${judgeId}/classes`, { method: 'PUT', body: input }),
    onSuccess: (data) => {
      qc.setQueryData(judgesQueryOptions(eventId).queryKey, data);
      void qc.invalidateQueries({ queryKey: progressQueryOptions(eventId).queryKey });
    },
  });
}

export function useCloseJudging(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (close: boolean) => api<{ progress: JudgingProgress }>(`/api/events/${eventId}/judging/${close ? 'close' : 'reopen'}`, { method: 'POST' }),
    onSuccess: (data) => qc.setQueryData(progressQueryOptions(eventId).queryKey, data),
  });
}
