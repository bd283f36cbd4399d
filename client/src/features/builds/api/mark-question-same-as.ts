import type { OwnQuestions } from '@shared/schemas/build-questions';
import { api } from '@client/lib/api';
import { useQuestionMutation } from './question-mutation';

export const markQuestionSameAs = (buildId: number, questionId: number, answeredId: number) =>
  api<{ questions: OwnQuestions }>(`/api/builds/${buildId}/questions/${questionId}/same-as`, { method: 'POST', body: { answeredId } });

export const useMarkQuestionSameAs = (buildId: number) => useQuestionMutation(buildId, ({ questionId, answeredId }: { questionId: number; answeredId: number }) => markQuestionSameAs(buildId, questionId, answeredId));
