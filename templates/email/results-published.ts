import { countOf } from '@shared/words';
import { ordinal, type OwnResults } from '@shared/schemas/results';
import { notice } from './notice';

/** Where the car finished, in one sentence. */
export function standingWords(r: OwnResults): string {
  if (r.total === null) return 'No judge finished a sheet for it, so it was not placed.';
  const parts = [];
  if (r.bestOfShow) parts.push('Best of show');
  if (r.place !== null && r.place <= r.placesAwarded) parts.push(`${ordinal(r.place)} place in ${r.className}${r.shared ? ' (shared)' : ''}`);
  else if (r.place !== null) parts.push(`${ordinal(r.place)} in ${r.className}${r.shared ? ' (shared)' : ''}; places were awarded to ${ordinal(r.placesAwarded)}`);
  return `${parts.join(', and ')}, with a total of ${r.total}.`;
}

/** The results e-mail to one entrant: their own place and scores, and the judges' comments when the show shares them. */
export function resultsPublishedEmail(p: { name: string; buildTitle: string; results: OwnResults; link: string }) {
  const r = p.results;
  const lines = r.criteria.map((c) => `${c.name}: ${c.mean} of ${c.maxPoints}${c.weight !== 1 ? ` (counts ×${c.weight})` : ''}${c.judges.length ? `; sheets ${c.judges.join(', ')}` : ''}`);
  const comments = r.comments === null ? [] : r.comments.length ? ['What the judges wrote:', ...r.comments.map((c) => `${c.criterion ? `${c.criterion}: ` : ''}“${c.text}”`)] : ['The judges left no comments.'];
  return notice({
    subject: `Results: ${r.showName}`,
    greeting: `Hello ${p.name},`,
    paragraphs: [
      `${r.showName} has published its results. ${p.buildTitle}, number ${r.number}: ${standingWords(r)}`,
      ...(r.sheetsCounted ? [`Your scores per criterion, the mean of ${countOf(r.sheetsCounted, 'judge’s sheet', 'judges’ sheets')}:`, ...lines] : []),
      ...comments,
    ],
    link: { label: 'See your entries', url: p.link },
  });
}
