import { createElement } from 'react';
import { renderToBuffer } from '@react-pdf/renderer';
import { formatInZone } from '@shared/calc/time-zone';
import { ownerCreditWords } from '@shared/schemas/owner-credit';
import { ordinal, placeWords, totalShown, type PrintPaper, type ResultsSnapshot, type SnapshotLine } from '@shared/schemas/results';
import { registerCardFonts } from '@templates/cards/fonts';
import type { CertificateContent, PrintLine, PrintShow, ResultsSheetContent } from '@templates/certificates/content';
import { ResultsSheetDocument } from '@templates/certificates/results-sheet';
import { CertificatesDocument } from '@templates/certificates/certificate';
import type { Event } from '../../models/event';
import { NotFoundError } from '../../errors';
import { awardsOf } from './awards';

type ShowFacts = Pick<Event, 'name' | 'venueName' | 'startsAt' | 'timeZone'>;

const printShow = (event: ShowFacts): PrintShow => ({
  name: event.name,
  when: formatInZone(event.startsAt.toISOString(), event.timeZone, { day: 'numeric', month: 'long', year: 'numeric' }),
  venue: event.venueName,
});

const ownerWords = (l: SnapshotLine) => (l.owner ? ownerCreditWords(l.owner) : '');
const printLine = (l: SnapshotLine): PrintLine => ({ place: placeWords(l.place, l.shared), number: l.number, title: l.title, owner: ownerWords(l), total: totalShown(l.total), note: l.decidedBy === 'score' ? '' : l.decidedBy });

function rulesNote(r: ResultsSnapshot['rules']): string {
  return [
    'Each car’s total is the weighted sum of the mean of its judges’ finished sheets',
    r.trimFromSheets ? `, without the single highest and lowest sheet when ${r.trimFromSheets} or more were finished` : '',
    `. Places 1st to ${ordinal(r.placesPerClass)} per class`,
    r.bestOfShow ? (r.bestOfShowKeepsClassPlace ? '; best of show also keeps its class place' : '; best of show is placed apart from its class') : '',
    '. Ties are broken by the sheet’s tie-break criteria in order, then shared unless the organiser ordered them with a reason.',
  ].join('');
}

const pdf = (element: ReturnType<typeof createElement>) => renderToBuffer(element as Parameters<typeof renderToBuffer>[0]);

/** The results sheet by class. */
export async function renderResultsSheet(event: ShowFacts, snapshot: ResultsSnapshot, paper: PrintPaper): Promise<Buffer> {
  registerCardFonts();
  const content: ResultsSheetContent = {
    show: printShow(event),
    publishedOn: formatInZone(snapshot.publishedAt, event.timeZone, { day: 'numeric', month: 'long', year: 'numeric' }),
    rulesNote: rulesNote(snapshot.rules),
    bestOfShow: snapshot.bestOfShow.map(printLine),
    peoplesChoice: (snapshot.peoplesChoice?.winners ?? []).map((l) => ({ ...printLine(l), place: placeWords(1, l.shared), total: String(l.total), note: 'visitors’ votes' })),
    classes: snapshot.classes.map((c) => ({ name: c.className, placings: c.placings.map(printLine), none: c.placings.length ? null : 'No car of this class was scored.' })),
  };
  return pdf(createElement(ResultsSheetDocument, { content, paper }));
}

/** One certificate per winner of each award (a shared place gives each car its own), or of one award by its key. */
export async function renderCertificates(event: ShowFacts, snapshot: ResultsSnapshot, paper: PrintPaper, awardKey?: string): Promise<Buffer> {
  registerCardFonts();
  const awards = awardsOf(snapshot).filter((a) => awardKey === undefined || a.key === awardKey);
  if (!awards.length) throw new NotFoundError(awardKey ? 'No such award in these results.' : 'These results have no awards to print.');
  const show = printShow(event);
  const certificates: CertificateContent[] = awards.flatMap((a) =>
    a.winners.map((w) => ({
      show,
      award: a.kind === 'best-of-show' ? 'Best of show' : a.kind === 'peoples-choice' ? 'People’s choice' : `${placeWords(w.place, false)} place`,
      className: a.className,
      shared: w.shared,
      number: w.number,
      title: w.title,
      owner: ownerWords(w),
      total: a.kind === 'peoples-choice' ? w.decidedBy : totalShown(w.total),
      totalLabel: a.kind === 'peoples-choice' ? 'VISITORS’ VOTES' : 'JUDGED TOTAL',
    })),
  );
  return pdf(createElement(CertificatesDocument, { certificates, paper, title: `Awards: ${event.name}` }));
}
