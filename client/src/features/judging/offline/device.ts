import { offlineDevice } from '@client/lib/offline-device';

/** The words a phone shows on a line the judge changed later on another phone. */
export const REPLACED_ON_OTHER_PHONE = 'Changed later on your other phone: the server keeps that value.';

// This judging phone's id and its count of the lines it wrote; the server tells apart a value another phone of the judge sent.
const judgingPhone = offlineDevice('placard-judging');
export const deviceId = judgingPhone.id;
export const nextSequence = judgingPhone.nextSequence;
