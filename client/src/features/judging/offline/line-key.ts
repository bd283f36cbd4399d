/** A line's key on the phone: a car and a criterion, or the car's comment. Free of IndexedDB, so pure code can use it. */
export const lineKey = (entryId: number, criterionId: number | 'note') => `${entryId}:${criterionId}`;
