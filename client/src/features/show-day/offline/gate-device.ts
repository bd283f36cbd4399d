import { offlineDevice } from '@client/lib/offline-device';

// This gate phone's id and its count of the check-ins it queued: the server takes them in this order.
const gatePhone = offlineDevice('placard-gate');
export const gateDeviceId = gatePhone.id;
export const nextGateSequence = gatePhone.nextSequence;
