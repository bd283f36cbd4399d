import { createStore, get, set, update } from 'idb-keyval';
import type { GateQueuedCheckIn, GateRoster } from '@shared/schemas/show-day';

/**
 * The gate's phone copy, in IndexedDB: the show's entries as last fetched, and every check-in made
 * here, written before any request, so a reload or a flat battery with no signal loses nothing.
 * `state`: pending until the server answered; then sent, twice (another gate had it first) or refused.
 */
export type QueuedState = 'pending' | 'sent' | 'twice' | 'refused';
export type QueuedCheckIn = { item: GateQueuedCheckIn; title: string; state: QueuedState; message?: string };

const store = createStore('placard-gate', 'gate');
const rosterKey = (eventId: number) => `roster:${eventId}`;
const queueKey = (eventId: number) => `check-ins:${eventId}`;

export const saveRoster = (roster: GateRoster) => set(rosterKey(roster.show.id), roster, store);
export const readRoster = (eventId: number) => get<GateRoster>(rosterKey(eventId), store);

export async function readQueue(eventId: number): Promise<Record<string, QueuedCheckIn>> {
  return (await get<Record<string, QueuedCheckIn>>(queueKey(eventId), store)) ?? {};
}

/** Read, change, write in one IndexedDB transaction, so two taps never overwrite each other. */
export async function writeQueue(eventId: number, change: (queue: Record<string, QueuedCheckIn>) => Record<string, QueuedCheckIn>): Promise<void> {
  await update<Record<string, QueuedCheckIn>>(queueKey(eventId), (old) => change({ ...(old ?? {}) }), store);
}
