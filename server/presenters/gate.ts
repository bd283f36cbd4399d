import { coverPhotoOf } from '@shared/build-sheet/cover';
import { gateProblemMessage } from '@shared/gate';
import { formatInZone } from '@shared/calc/time-zone';
import { paymentStateOf, type GateCard, type GateCounts, type GateProblem } from '@shared/schemas/show-day';
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
type GateFinding = { entry: Entry; problem: GateProblem | null } | { entry: null; problem: GateProblem; otherShowName?: string };

/** What the gate's phone shows: the car, and the problem in the gate's words if there is one. */
export function presentGateCard(finding: GateFinding, event: Pick<Event, 'timeZone'>): GateCard {
  const { entry, problem } = finding;
  if (!entry) {
    const showName = 'otherShowName' in finding ? finding.otherShowName : undefined;
    return { entry: null, problem, message: gateProblemMessage(problem, { showName }), canCheckIn: false, canTakeCash: false };
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
