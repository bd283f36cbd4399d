/**
 * This gate phone's id and its count of the check-ins it queued: the server takes one phone's
 * check-ins in this order, never by the phone's clock. In localStorage, read without waiting.
 */
const ID_KEY = 'placard-gate-device';
const SEQUENCE_KEY = 'placard-gate-sequence';

export function gateDeviceId(): string {
  let id = localStorage.getItem(ID_KEY);
  if (!id) {
    id = crypto.randomUUID();
    localStorage.setItem(ID_KEY, id);
    localStorage.setItem(SEQUENCE_KEY, '0');
  }
  return id;
}

export function nextGateSequence(): number {
  gateDeviceId();
  const next = Number(localStorage.getItem(SEQUENCE_KEY) ?? '0') + 1;
  localStorage.setItem(SEQUENCE_KEY, String(next));
  return next;
}
