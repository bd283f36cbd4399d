import { ordinal, type Award, type ResultsSnapshot } from '@shared/schemas/results';

/**
 * Every award of published results, in the order a ceremony reads them: best of show first, then each
 * class from 1st place down. Other awards of a show (people's choice) are added to this list here.
 */
export function awardsOf(snapshot: ResultsSnapshot): Award[] {
  const awards: Award[] = [];
  if (snapshot.bestOfShow.length) awards.push({ key: 'best-of-show', name: 'Best of show', kind: 'best-of-show', place: null, className: null, winners: snapshot.bestOfShow });
  for (const c of snapshot.classes) {
    const places = [...new Set(c.placings.map((p) => p.place))].sort((a, b) => a - b);
    for (const place of places) {
      awards.push({ key: `class:${c.classId}:${place}`, name: `${ordinal(place)} place, ${c.className}`, kind: 'class-place', place, className: c.className, winners: c.placings.filter((p) => p.place === place) });
    }
  }
  if (snapshot.peoplesChoice) awards.push({ key: 'peoples-choice', name: "People's choice", kind: 'peoples-choice', place: null, className: null, winners: snapshot.peoplesChoice.winners });
  return awards;
}
