/**
 * This phone's id and its count of the lines it wrote. The server orders one phone's lines by this
 * count, never by the phone's clock, and tells apart a value another phone of the judge sent.
 * Kept in localStorage: read without waiting, and cleared together, so a count never restarts under an old id.
 */
/** The words a phone shows on a line the judge changed later on another phone. */
export const REPLACED_ON_OTHER_PHONE = 'Changed later on your other phone: the server keeps that value.';

const ID_KEY = 'placard-judging-device';
const SEQUENCE_KEY = 'placard-judging-sequence';

export function deviceId(): string {
  let id = localStorage.getItem(ID_KEY);
  if (!id) {
    id = crypto.randomUUID();
    localStorage.setItem(ID_KEY, id);
    localStorage.setItem(SEQUENCE_KEY, '0');
  }
  return id;
}

/** The next number of this phone's count. */
export function nextSequence(): number {
  deviceId();
  const next = Number(localStorage.getItem(SEQUENCE_KEY) ?? '0') + 1;
  localStorage.setItem(SEQUENCE_KEY, String(next));
  return next;
}
