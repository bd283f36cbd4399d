import { ResultsSnapshotSchema, type ResultsSnapshot } from '@shared/schemas/results';
import { PublishedResults } from '../../models/published-results';

/** The published results of a show, checked against their schema, or null before publication. */
export async function loadPublishedResults(eventId: number): Promise<ResultsSnapshot | null> {
  const row = await PublishedResults.findByPk(eventId);
  return row ? ResultsSnapshotSchema.parse(row.results) : null;
}
