import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { OwnQuestions } from '@shared/schemas/build-questions';
import { buildLogKeys } from './build-log-keys';

/** Every change to the questions answers with both lists (answered and waiting): put them straight in the cache. */
export function useQuestionMutation<TInput>(buildId: number, mutationFn: (input: TInput) => Promise<{ questions: OwnQuestions }>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn, onSuccess: (answer) => qc.setQueryData(buildLogKeys.questions(buildId), answer) });
}
