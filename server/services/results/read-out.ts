import type { ResultsSnapshot, SnapshotLine } from '@shared/schemas/results';

export type ReadOutSectionData = { kind: 'class' | 'best-of-show' | 'peoples-choice'; className: string | null; lines: SnapshotLine[] };

/**
 * The order an announcer calls the awards: each class from its last place up to first (the suspense
 * builds to the winner), then best of show, then people's choice. A shared place is called together.
 */
export function readOutOf(snapshot: ResultsSnapshot): ReadOutSectionData[] {
  const lastToFirst = (lines: SnapshotLine[]) => [...lines].sort((a, b) => b.place - a.place || a.number - b.number);
  const sections: ReadOutSectionData[] = snapshot.classes.filter((c) => c.placings.length).map((c) => ({ kind: 'class', className: c.className, lines: lastToFirst(c.placings) }));
  if (snapshot.bestOfShow.length) sections.push({ kind: 'best-of-show', className: null, lines: snapshot.bestOfShow });
  if (snapshot.peoplesChoice?.winners.length) sections.push({ kind: 'peoples-choice', className: null, lines: snapshot.peoplesChoice.winners });
  return sections;
}
