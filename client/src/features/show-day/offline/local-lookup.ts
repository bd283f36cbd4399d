import { formatInZone } from '@shared/calc/time-zone';
import { cardOfAnotherShow, gateProblemMessage, gateProblemOf, gateScanOf } from '@shared/gate';
import type { GateCard, GateRoster } from '@shared/schemas/show-day';
import type { QueuedCheckIn } from './gate-store';

/**
 * The gate's answer from the phone's copy, when there is no signal: the same rules as the server's
 * (`gateProblemOf`, another show's card refused by its marks), with a car checked in on this phone
 * counted as checked in. A car entered elsewhere cannot be told from one not entered: the copy holds this show only.
 */
export function lookUpOnPhone(roster: GateRoster, queue: Record<string, QueuedCheckIn>, what: { code: string } | { number: number }): GateCard | { notFound: string } {
  let number: number | null = null;
  if ('code' in what) {
    const scan = gateScanOf(what.code);
    if (!scan) return refused('unknown_code');
    const numberHere = roster.entries.find((e) => e.buildCode === scan.code)?.number;
    // Offline the phone cannot ask whether the marked address is another show's: a number that differs from this show's tells.
    if (cardOfAnotherShow(scan, roster.show, numberHere, false)) return { ...refused('other_show'), message: gateProblemMessage('other_show', { numberHere }) };
    const entry = roster.entries.find((e) => e.buildCode === scan.code);
    if (!entry) return refused('not_entered');
    number = entry.number;
  } else number = what.number;
  const entry = roster.entries.find((e) => e.number === number);
  if (!entry) return { notFound: `No entry number ${number} in this show.` };
  const here = Object.values(queue).find((q) => q.item.number === entry.number && q.state !== 'refused');
  const status = here ? 'checked_in' : entry.status;
  const payment = here?.item.takeCash ? 'paid' : entry.payment;
  const checkedInAt = here ? here.item.at : entry.checkedInAt;
  const problem = gateProblemOf({ status });
  const at = checkedInAt ? formatInZone(checkedInAt, roster.show.timeZone, { hour: '2-digit', minute: '2-digit' }) : undefined;
  return {
    entry: { id: entry.id, number: entry.number, title: entry.title, className: entry.className, classId: entry.classId, status, payment, feeAmount: entry.feeAmount, currency: entry.currency, checkedInAt, cover: null },
    problem,
    message: problem ? gateProblemMessage(problem, { number: entry.number, at }) : null,
    canCheckIn: problem === null,
    canTakeCash: problem === 'unpaid',
  };
}

const refused = (problem: 'unknown_code' | 'not_entered' | 'other_show'): GateCard => ({ entry: null, problem, message: gateProblemMessage(problem), canCheckIn: false, canTakeCash: false });
