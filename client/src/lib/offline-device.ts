/**
 * A phone's id and its count of what it queued while offline, under one name per area (the judge's
 * lines, the gate's check-ins). The server orders one phone's items by this count, never by the
 * phone's clock. Kept in localStorage: read without waiting, and cleared together, so a count never
 * restarts under an old id.
 */
export function offlineDevice(name: string) {
  const idKey = `${name}-device`;
  const sequenceKey = `${name}-sequence`;
  const id = (): string => {
    let value = localStorage.getItem(idKey);
    if (!value) {
      value = crypto.randomUUID();
      localStorage.setItem(idKey, value);
      localStorage.setItem(sequenceKey, '0');
    }
    return value;
  };
  /** The next number of this phone's count. */
  const nextSequence = (): number => {
    id();
    const next = Number(localStorage.getItem(sequenceKey) ?? '0') + 1;
    localStorage.setItem(sequenceKey, String(next));
    return next;
  };
  return { id, nextSequence };
}
