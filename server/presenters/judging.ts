import type { JudgeCar, JudgeSummary, JudgeView, JudgingProgress } from '@shared/schemas/judging';
import type { Build } from '../models/build';
import type { Criterion } from '../models/criterion';
import type { Entry } from '../models/entry';
import type { Event } from '../models/event';
import type { Score } from '../models/score';
import type { SheetNote } from '../models/sheet-note';
import { computeKeyFigures } from '@shared/build-sheet/key-figures';
import { presentPublicBuild, presentPublicBuildTile } from './public-build';

/** A car as the judge sees it: its public face only (no owner contact, no private fields). */
export function presentJudgeCar(entry: Entry, build: Build): JudgeCar {
  const tile = presentPublicBuildTile(build);
  const source = tile.cover?.sources.find((s) => s.width >= 480) ?? tile.cover?.sources[0];
  const figures = computeKeyFigures(presentPublicBuild(build)).map((f) => ({ label: f.label, metric: f.metric.text, imperial: f.imperial.text, provenance: f.provenance }));
  return {
    entryId: entry.id,
    number: entry.number as number,
    classId: entry.classId,
    className: entry.eventClass?.name ?? '',
    title: build.title,
    code: build.code,
    cover: source ? { url: source.jpeg, width: source.width, height: source.height } : null,
    figures,
  };
}

export function presentJudgeView(data: { event: Event; criteria: Criterion[]; cars: Array<{ entry: Entry; build: Build }>; expected: Array<{ entry: Entry; title: string }>; scores: Score[]; notes: SheetNote[] }, closedReason: string | null): JudgeView {
  const { event } = data;
  return {
    event: { id: event.id, name: event.name, slug: event.slug, status: event.status, judgingOpen: closedReason === null, closedReason },
    criteria: data.criteria.map((c) => ({ id: c.id, name: c.name, maxPoints: c.maxPoints, weight: Number(c.weight), position: c.position })),
    cars: data.cars.map(({ entry, build }) => presentJudgeCar(entry, build)),
    expected: data.expected.map(({ entry, title }) => ({ entryId: entry.id, number: entry.number as number, className: entry.eventClass?.name ?? '', title })),
    scores: data.scores.map((s) => ({ entryId: s.entryId, criterionId: s.criterionId, points: s.points, comment: s.comment, deviceTime: s.deviceTime.toISOString(), clientId: s.clientId, deviceId: s.deviceId })),
    notes: data.notes.map((n) => ({ entryId: n.entryId, comment: n.comment, deviceTime: n.deviceTime.toISOString(), clientId: n.clientId, deviceId: n.deviceId })),
  };
}

export const presentJudge = (j: JudgeSummary): JudgeSummary => ({ id: j.id, name: j.name, allClasses: j.allClasses, classIds: [...j.classIds] });

export function presentProgress(p: { lines: number; byClass: JudgingProgress['byClass']; byJudge: JudgingProgress['byJudge'] }, judgingOpen: boolean): JudgingProgress {
  return {
    judgingOpen,
    lines: p.lines,
    byClass: p.byClass.map((c) => ({ classId: c.classId, name: c.name, cars: c.cars, bySheets: c.bySheets.map((b) => ({ sheets: b.sheets, cars: b.cars })) })),
    byJudge: p.byJudge.map((j) => ({ judgeId: j.judgeId, name: j.name, allClasses: j.allClasses, classIds: [...j.classIds], cars: j.cars, scored: j.scored, partly: j.partly, notYet: j.notYet, leftNumbers: [...j.leftNumbers] })),
  };
}
