import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ResultsReview, ShowResultRules } from '@shared/schemas/judging';
import type { ManualTieBreakView, PublishWarning } from '@shared/schemas/results';
import { api } from '@client/lib/api';
import { resultsKeys } from './results-keys';

export type ResultsReviewAnswer = { review: ResultsReview; tieBreaks: ManualTieBreakView[]; rules: ShowResultRules; published: boolean; warnings: PublishWarning[] };

export const getResultsReview = (eventId: number) => api<ResultsReviewAnswer>(`/api/events/${eventId}/results/review`);
export const resultsReviewQueryOptions = (eventId: number) => queryOptions({ queryKey: resultsKeys.review(eventId), queryFn: () => getResultsReview(eventId) });
export const useResultsReview = (eventId: number) => useQuery(resultsReviewQueryOptions(eventId));
