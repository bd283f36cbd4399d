// What an owner reads before paying: the show's refund rule and the places left in a class.
import type { RefundRule } from './calc/refund';
import { formatInZone } from './calc/time-zone';
import { countOf } from './words';

const refundDeadline = (iso: string, timeZone: string) =>
  `${formatInZone(iso, timeZone, { weekday: 'short', day: 'numeric', month: 'long', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' })} (${timeZone})`;

/** The refund rule in one sentence, its deadline in the show's time zone (the rule itself is `refundDue`). */
export function refundRuleWords(rule: RefundRule, timeZone: string, entryFee: number): string {
  if (entryFee === 0) return 'Entry is free, so there is nothing to refund.';
  const afterwards = Math.min(100, Math.max(0, rule.afterwardsPercent));
  const partWords = afterwards === 100 ? 'the whole fee back' : afterwards === 0 ? 'no refund' : `${afterwards}% of the fee back`;
  if (!rule.fullRefundUntil) return afterwards === 0 ? 'No refund if you withdraw.' : `Withdraw at any time for ${partWords}.`;
  return `Withdraw by ${refundDeadline(rule.fullRefundUntil, timeZone)} for the whole fee back; after that, ${partWords}.`;
}

/** Places left in a class: null means neither the class nor the show sets a limit. */
export function placesLeftWords(placesLeft: number | null): string {
  if (placesLeft === null) return 'No limit on places';
  if (placesLeft <= 0) return 'Full: new entries join the waiting list';
  return `${countOf(placesLeft, 'place')} left`;
}
