import { BUILD_CODE_ALPHABET } from './build-code';
import type { GateProblem } from './schemas/show-day';

const CODE = new RegExp(`^[${BUILD_CODE_ALPHABET}]{6,8}$`);

/** The build code in what a scanner read: a card's `/c/<code>` address or the bare code. Null when it is neither. */
export function buildCodeFromScan(text: string): string | null {
  const trimmed = text.trim();
  const fromUrl = /\/c\/([A-Za-z0-9]{6,8})\/?(?:[?#].*)?$/.exec(trimmed)?.[1];
  const code = (fromUrl ?? trimmed).toUpperCase();
  return CODE.test(code) ? code : null;
}

/**
 * The address a show's numbered card encodes: the car's public page, marked with the show and the
 * number, so a gate tells a card of another show from its own (the public page ignores the marks).
 */
export const numberedCardAddress = (baseUrl: string, code: string, showSlug: string, number: number) => `${baseUrl}/c/${code}?show=${encodeURIComponent(showSlug)}&no=${number}`;

/** What a scan names: the car's code, and the show and number when it is a show's numbered card. Null when not a card. */
export function gateScanOf(text: string): { code: string; showSlug: string | null; number: number | null } | null {
  const code = buildCodeFromScan(text);
  if (!code) return null;
  const mark = (name: string, value: string) => new RegExp(`[?&]${name}=(${value})(?:&|#|$)`).exec(text.trim())?.[1] ?? null;
  const number = mark('no', '\\d{1,9}');
  return { code, showSlug: mark('show', '[a-z0-9-]{1,80}'), number: number === null ? null : Number(number) };
}

/**
 * Whether a scanned card was printed for another show than `here`. A card marked with this show's
 * address is ours; one marked with an address no show has now (this show's, before a rename) is
 * ours when it carries the number the car has here.
 */
export function cardOfAnotherShow(scan: { showSlug: string | null; number: number | null }, here: { slug: string }, numberHere: number | null | undefined, slugExists: boolean): boolean {
  if (scan.showSlug === null || scan.showSlug === here.slug) return false;
  return slugExists || scan.number === null || scan.number !== numberHere;
}

/** Why the gate may not simply check this entry in, or null when it may: one rule for the server and the phone's copy. */
export function gateProblemOf(entry: { status: string }): GateProblem | null {
  if (entry.status === 'checked_in') return 'already_checked_in';
  if (entry.status === 'withdrawn') return 'withdrawn';
  if (entry.status === 'waiting_list') return 'waiting_list';
  if (entry.status === 'awaiting_payment') return 'unpaid';
  return null;
}

/** The words the gate shows for each problem. */
export function gateProblemMessage(problem: GateProblem, detail: { number?: number | null; showName?: string; at?: string; numberHere?: number | null } = {}): string {
  const n = detail.number ? `Entry ${detail.number}` : 'This entry';
  switch (problem) {
    case 'unknown_code':
      return 'Unknown code: this is not a Placard card.';
    case 'not_entered':
      return 'This car is not entered in this show.';
    case 'other_show':
      if (detail.numberHere) return `This card is for ${detail.showName || 'another show'}, not this one. The car is entered here as No. ${detail.numberHere}: type that number.`;
      return `This card is for ${detail.showName || 'another show'}, not this one; the car is not entered here.`;
    case 'unpaid':
      return `${n} is not paid yet. Take the fee in cash to check it in.`;
    case 'withdrawn':
      return `${n} was withdrawn. Send the entrant to the organiser.`;
    case 'waiting_list':
      return `${n} is on the waiting list and has no place. Send the entrant to the organiser.`;
    case 'already_checked_in':
      return `${n} is already checked in${detail.at ? ` (at ${detail.at})` : ''}. Nothing changed.`;
  }
}

/** The words for a car two gates checked in: both times (the first is kept), and the cash to hand back if this phone took any. */
export function checkedInTwiceMessage(number: number, firstAt: string, thisPhoneAt: string, thisPhoneTookCash: boolean): string {
  return `No. ${number} was checked in twice: first at ${firstAt} (kept), and at ${thisPhoneAt} on this phone.${thisPhoneTookCash ? ' It was paid already: hand the cash back.' : ''}`;
}

/** The words for a queued check-in the server refused that is no entry of this show. */
export const noSuchNumberMessage = (number: number) => `No entry number ${number} in this show.`;
