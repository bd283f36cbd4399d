import { BUILD_CODE_ALPHABET } from './schemas/build';
import type { GateProblem } from './schemas/show-day';

const CODE = new RegExp(`^[${BUILD_CODE_ALPHABET}]{6,8}$`);

/** The build code in what a scanner read: a card's `/c/<code>` address or the bare code. Null when it is neither. */
export function buildCodeFromScan(text: string): string | null {
  const trimmed = text.trim();
  const fromUrl = /\/c\/([A-Za-z0-9]{6,8})\/?(?:[?#].*)?$/.exec(trimmed)?.[1];
  const code = (fromUrl ?? trimmed).toUpperCase();
  return CODE.test(code) ? code : null;
}

/** The words the gate shows for each problem. */
export function gateProblemMessage(problem: GateProblem, detail: { number?: number | null; showName?: string; at?: string } = {}): string {
  const n = detail.number ? `Entry ${detail.number}` : 'This entry';
  switch (problem) {
    case 'unknown_code':
      return 'Unknown code: this is not a Placard card.';
    case 'not_entered':
      return 'This car is not entered in this show.';
    case 'other_show':
      return `This card is for another show${detail.showName ? ` (${detail.showName})` : ''}; the car is not entered here.`;
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
