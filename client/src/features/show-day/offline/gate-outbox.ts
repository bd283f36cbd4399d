import { refusedForGood, startOfflineSendLoop } from '@client/lib/offline-send-loop';
import { GATE_SYNC_MAX } from '@shared/gate-phone';
import { sendGateCheckIns } from '../api/send-gate-check-ins';
import { gateDeviceId, nextGateSequence } from './gate-device';
import { readQueue, writeQueue, type QueuedCheckIn } from './gate-store';

/**
 * The gate's outbox, after the judges' (`features/judging/offline/outbox.ts`): a check-in made with no
 * signal is written to the phone first, then sent on start, on `online`, after each tap and every few
 * seconds. The server applies each once by its id, so sending twice is harmless; a check-in leaves
 * "pending" only when the server answered.
 */
type Listener = () => void;
const listeners = new Set<Listener>();
const changed = () => listeners.forEach((l) => l());
export const subscribeToGateOutbox = (l: Listener) => {
  listeners.add(l);
  return () => void listeners.delete(l);
};

export async function queueCheckIn(eventId: number, number: number, takeCash: boolean, title: string): Promise<void> {
  const item = { clientId: crypto.randomUUID(), sequence: nextGateSequence(), number, takeCash, at: new Date().toISOString() };
  await writeQueue(eventId, (q) => ({ ...q, [item.clientId]: { item, title, state: 'pending' } }));
  changed();
  void flushGateOutbox(eventId);
}

const sending = new Set<number>();

export async function flushGateOutbox(eventId: number): Promise<void> {
  if (sending.has(eventId)) return;
  sending.add(eventId);
  try {
    for (;;) {
      const pending = Object.values(await readQueue(eventId))
        .filter((q) => q.state === 'pending')
        .sort((a, b) => a.item.sequence - b.item.sequence)
        .slice(0, GATE_SYNC_MAX);
      if (!pending.length) return;
      let outcome: (clientId: string) => Pick<QueuedCheckIn, 'state' | 'message'>;
      try {
        const { results } = await sendGateCheckIns(eventId, { deviceId: gateDeviceId(), checkIns: pending.map((p) => p.item) });
        const byId = new Map(results.map((r) => [r.clientId, r]));
        outcome = (id) => {
          const r = byId.get(id);
          if (!r) return { state: 'pending' };
          const state = r.outcome === 'checked_in' ? 'sent' : r.outcome === 'already_checked_in' ? 'twice' : 'refused';
          return { state, message: r.message ?? undefined };
        };
      } catch (err) {
        if (!refusedForGood(err)) return; // later
        const refusal = { state: 'refused' as const, message: err.message };
        outcome = () => refusal;
      }
      const ids = new Set(pending.map((p) => p.item.clientId));
      await writeQueue(eventId, (q) => {
        for (const id of ids) if (q[id]) q[id] = { ...q[id], ...outcome(id) };
        return q;
      });
      changed();
    }
  } finally {
    sending.delete(eventId);
  }
}

export const startGateSendLoop = (eventId: number, everyMs = 5000): (() => void) => startOfflineSendLoop(() => flushGateOutbox(eventId), everyMs);
