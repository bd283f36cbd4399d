import type { OwnQuestions } from '@shared/schemas/build-questions';
import { api } from '@client/lib/api';
import { useQuestionMutation } from './question-mutation';

/** Discards a waiting question, or takes an answered one off the page. */
export const deleteQuestion = (buildId: number, questionId: number) => api<{ questions: OwnQuestions }>(`/api/builds/${buildId}/questions/${questionId}`, { method: 'DELETE' });

export const useDeleteQuestion = (buildId: number) => useQuestionMutation(buildId, (questionId: number) => deleteQuestion(buildId, questionId));
