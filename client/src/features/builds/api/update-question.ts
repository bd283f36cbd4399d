import type { OwnQuestions, QuestionUpdateInput } from '@shared/schemas/build-questions';
import { api } from '@client/lib/api';
import { useQuestionMutation } from './question-mutation';

/** Answers a waiting question, or edits an answered one. */
export const updateQuestion = (buildId: number, questionId: number, input: QuestionUpdateInput) =>
  api<{ questions: OwnQuestions }>(`/api/builds/${buildId}/questions/${questionId}`, { method: 'PATCH', body: input });

export const useUpdateQuestion = (buildId: number) => useQuestionMutation(buildId, ({ questionId, input }: { questionId: number; input: QuestionUpdateInput }) => updateQuestion(buildId, questionId, input));
