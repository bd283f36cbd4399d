import type { ShowResults } from '@shared/calc/results';
import type { ShowResultRules } from '@shared/schemas/judging';
import type { PublishWarning, ResultsSnapshot } from '@shared/schemas/results';
import { publishWarnings } from './publish-warnings';
import type { Event } from '../../models/event';
import { loadEventDetail } from '../shows/events';
import { computeShowResults, rulesOf } from './results';
import { listTieBreaks } from './tie-breaks';
import { loadPublishedResults } from './published-results';

export type ResultsReviewData = {
  results: ShowResults;
  cars: Awaited<ReturnType<typeof computeShowResults>>['cars'];
  criteria: Map<number, string>;
  classNames: Map<number, string>;
  tieBreaks: Awaited<ReturnType<typeof listTieBreaks>>;
  published: ResultsSnapshot | null;
  rules: ShowResultRules;
  /** What publishing now would leave out; none once published. */
  warnings: PublishWarning[];
};

/**
 * What the organiser reviews before publishing: the results as they stand, with the names of the
 * criteria and classes and the ties ordered by hand; once published, what was published.
 */
export async function loadResultsReview(event: Event): Promise<ResultsReviewData> {
  const detail = await loadEventDetail(event.id);
  const { results, cars } = await computeShowResults(event.id);
  const tieBreaks = await listTieBreaks(event.id);
  const published = await loadPublishedResults(event.id);
  return {
    results,
    cars,
    criteria: new Map((detail.criteria ?? []).map((c) => [c.id, c.name])),
    classNames: new Map((detail.classes ?? []).map((c) => [c.id, c.name])),
    tieBreaks,
    published,
    rules: published ? published.rules : rulesOf(event),
    warnings: published ? [] : await publishWarnings(event.id),
  };
}
