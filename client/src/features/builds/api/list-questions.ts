import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OwnQuestions } from '@shared/schemas/build-questions';
import { api } from '@client/lib/api';
import { buildLogKeys } from './build-log-keys';

export const listQuestions = (buildId: number) => api<{ questions: OwnQuestions }>(`/api/builds/${buildId}/questions`);

export const questionsQueryOptions = (buildId: number) => queryOptions({ queryKey: buildLogKeys.questions(buildId), queryFn: () => listQuestions(buildId) });

export const useQuestions = (buildId: number) => useQuery(questionsQueryOptions(buildId));
