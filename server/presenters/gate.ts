import { coverPhotoOf } from '@shared/build-sheet/cover';
import { checkedInTwiceMessage, gateProblemMessage, noSuchNumberMessage } from '@shared/gate';
import { formatInZone } from '@shared/calc/time-zone';
import { paymentStateOf, type GateCard, type GateCounts, type GateProblem, type GateRoster, type GateRosterEntry, type GateSyncResult } from '@shared/schemas/show-day';
import type { Build } from '../models/build';
import type { Event } from '../models/event';
import type { Entry } from '../models/entry';
import { mediaUrl, photoVariantKey } from '../storage/keys';

/** The car's cover at the smallest size at least 480 px wide: enough for a phone at the gate. */
function gateCoverOf(build: Build | undefined) {
  const cover = coverPhotoOf(build?.photos);
  if (!cover) return null;
  const variants = [...cover.variants].sort((a, b) => a.width - b.width);
  const v = variants.find((x) => x.width >= 480) ?? variants[variants.length - 1];
  return v ? { src: mediaUrl(photoVariantKey(cover.storageKey, v.width, 'jpg')), width: v.width, height: v.height } : null;
}

/** What the gate service found (an entry of this show, or nothing and why). */
type GateFinding = { entry: Entry; problem: GateProblem | null } | { entry: null; problem: GateProblem; otherShowName?: string; numberHere?: number | null };

/** What the gate's phone shows: the car, and the problem in the gate's words if there is one. */
export function presentGateCard(finding: GateFinding, event: Pick<Event, 'timeZone'>): GateCard {
  const { entry, problem } = finding;
  if (!entry) {
    const showName = 'otherShowName' in finding ? finding.otherShowName : undefined;
    const numberHere = 'numberHere' in finding ? finding.numberHere : undefined;
    return { entry: null, problem, message: gateProblemMessage(problem, { showName, numberHere }), canCheckIn: false, canTakeCash: false };
  }
  const at = entry.checkedInAt ? formatInZone(entry.checkedInAt.toISOString(), event.timeZone, { hour: '2-digit', minute: '2-digit' }) : undefined;
  return {
    entry: {
      id: entry.id,
      number: entry.number,
      title: entry.build?.title ?? '',
      className: entry.eventClass?.name ?? '',
      classId: entry.classId,
      status: entry.status,
      payment: paymentStateOf(entry),
      feeAmount: entry.feeAmount,
      currency: entry.currency,
      checkedInAt: entry.checkedInAt ? entry.checkedInAt.toISOString() : null,
      cover: gateCoverOf(entry.build),
    },
    problem,
    message: problem ? gateProblemMessage(problem, { number: entry.number, at }) : null,
    canCheckIn: problem === null,
    canTakeCash: problem === 'unpaid',
  };
}

export function presentGateCounts(counts: GateCounts): GateCounts {
  return {
    classes: counts.classes.map((c) => ({ classId: c.classId, name: c.name, arrived: c.arrived, expected: c.expected })),
    arrived: counts.arrived,
    expected: counts.expected,
  };
}

/** One entry as the gate's phone keeps it: public fields only (no owner, no contact, no private build fields). */
export function presentGateRosterEntry(entry: Entry): GateRosterEntry {
  return {
    id: entry.id,
    number: entry.number,
    buildCode: entry.build?.code ?? '',
    title: entry.build?.title ?? '',
    classId: entry.classId,
    className: entry.eventClass?.name ?? '',
    status: entry.status,
    payment: paymentStateOf(entry),
    feeAmount: entry.feeAmount,
    currency: entry.currency,
    checkedInAt: entry.checkedInAt ? entry.checkedInAt.toISOString() : null,
  };
}

export function presentGateRoster(event: Pick<Event, 'id' | 'name' | 'slug' | 'timeZone'>, checkIn: boolean, entries: Entry[], fetchedAt: Date): GateRoster {
  return { show: { id: event.id, name: event.name, slug: event.slug, timeZone: event.timeZone, checkIn }, entries: entries.map(presentGateRosterEntry), fetchedAt: fetchedAt.toISOString() };
}

/** One queued check-in's answer, with the gate's words for a refusal or for a car two gates checked in. */
type AppliedCheckIn = Omit<GateSyncResult, 'message'> & { problem: GateProblem | null; phoneTookCash: boolean };

export function presentGateSyncResult(a: AppliedCheckIn, event: Pick<Event, 'timeZone'>): GateSyncResult {
  const time = (iso: string) => formatInZone(iso, event.timeZone, { hour: '2-digit', minute: '2-digit' });
  let message: string | null = null;
  if (a.outcome === 'already_checked_in' && a.checkedInAt) message = checkedInTwiceMessage(a.number, time(a.checkedInAt), time(a.at), a.phoneTookCash && !a.cashTaken);
  if (a.outcome === 'refused') message = a.problem ? gateProblemMessage(a.problem, { number: a.number }) : noSuchNumberMessage(a.number);
  return { clientId: a.clientId, number: a.number, outcome: a.outcome, checkedInAt: a.checkedInAt, at: a.at, cashTaken: a.cashTaken, message };
}
