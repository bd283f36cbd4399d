import type { OwnQuestions, QuestionCreateInput } from '@shared/schemas/build-questions';
import { api } from '@client/lib/api';
import { useQuestionMutation } from './question-mutation';

export const createQuestion = (buildId: number, input: QuestionCreateInput) => api<{ questions: OwnQuestions }>(`/api/builds/${buildId}/questions`, { method: 'POST', body: input });

export const useCreateQuestion = (buildId: number) => useQuestionMutation(buildId, (input: QuestionCreateInput) => createQuestion(buildId, input));
