import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { JudgeClassesInput, JudgeSummary } from '@shared/schemas/judging';
import { api } from '@client/lib/api';
import { judgingKeys } from './judging-keys';

export type AssignJudgeInput = { judgeId: number; input: JudgeClassesInput };

export const assignJudge = (eventId: number, { judgeId, input }: AssignJudgeInput) =>
  api<{ judges: JudgeSummary[] }>(`/api/events/${eventId}/judges/${judgeId}/classes`, { method: 'PUT', body: input });

/** Sets the classes one judge scores; the answer is every judge, and the progress counts change with it. */
export function useAssignJudge(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (assignment: AssignJudgeInput) => assignJudge(eventId, assignment),
    onSuccess: (data) => {
      qc.setQueryData(judgingKeys.judges(eventId), data);
      void qc.invalidateQueries({ queryKey: judgingKeys.progress(eventId) });
    },
  });
}
