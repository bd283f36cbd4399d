import { refusedForGood, startOfflineSendLoop } from '@client/lib/offline-send-loop';
import type { NoteItem, ScoreItem } from '@shared/schemas/judging';
import { SCORE_ITEMS_PER_REQUEST_MAX } from '@shared/judging/sheet-state';
import { sendScores } from '../api/send-scores';
import { lineKey, readLines, writeLines, type LocalLine } from './sheet-store';
import { deviceId, nextSequence, REPLACED_ON_OTHER_PHONE } from './device';

/**
 * The outbox: lines in state "pending" are sent by this loop, in this phone's order (its sequence),
 * whenever there is a connection (on start, on the browser's `online` event, after each tap and every
 * few seconds). The server orders the judge's lines itself and ignores a replay, so sending a line twice
 * is harmless: a line becomes "sent" only after the server answered, never before; "replaced" when the
 * server says another phone of the judge changed it later.
 */
type Listener = () => void;
const listeners = new Set<Listener>();
let version = 0;
const changed = () => {
  version++;
  for (const l of listeners) l();
};
export const subscribe = (l: Listener) => {
  listeners.add(l);
  return () => listeners.delete(l);
};
export const outboxVersion = () => version;

const newId = () => crypto.randomUUID();
const stamp = () => ({ clientId: newId(), deviceTime: new Date().toISOString(), sequence: nextSequence() });

export async function recordScore(eventId: number, entryId: number, criterionId: number, points: number, comment: string) {
  const item: ScoreItem = { ...stamp(), entryId, criterionId, points, comment };
  const key = lineKey(entryId, criterionId);
  await writeLines(eventId, (lines) => ({ ...lines, [key]: { key, kind: 'score', eventId, item, state: 'pending' } }));
  changed();
  void flush(eventId);
}

export async function recordNote(eventId: number, entryId: number, comment: string) {
  const item: NoteItem = { ...stamp(), entryId, comment };
  const key = lineKey(entryId, 'note');
  await writeLines(eventId, (lines) => ({ ...lines, [key]: { key, kind: 'note', eventId, item, state: 'pending' } }));
  changed();
  void flush(eventId);
}

const sending = new Set<number>();

/** Sends what is pending for one show; a lost connection leaves it pending, a refusal is kept with its reason. */
export async function flush(eventId: number): Promise<void> {
  if (sending.has(eventId)) return;
  sending.add(eventId);
  try {
    for (;;) {
      const pending = Object.values(await readLines(eventId))
        .filter((l) => l.state === 'pending')
        .sort((a, b) => (a.item.sequence ?? 0) - (b.item.sequence ?? 0) || a.item.deviceTime.localeCompare(b.item.deviceTime))
        .slice(0, SCORE_ITEMS_PER_REQUEST_MAX);
      if (!pending.length) return;
      const scores = pending.filter((l): l is Extract<LocalLine, { kind: 'score' }> => l.kind === 'score').map((l) => l.item);
      const notes = pending.filter((l): l is Extract<LocalLine, { kind: 'note' }> => l.kind === 'note').map((l) => l.item);
      let outcome: (clientId: string) => Pick<LocalLine, 'state' | 'message' | 'answeredAt'>;
      try {
        const { applied } = await sendScores(eventId, { deviceId: deviceId(), scores, notes });
        const replaced = new Set(applied.filter((a) => a.replacedByOtherDevice).map((a) => a.clientId));
        const answeredAt = Date.now();
        outcome = (id) => (replaced.has(id) ? { state: 'replaced', message: REPLACED_ON_OTHER_PHONE, answeredAt } : { state: 'sent', answeredAt });
      } catch (err) {
        if (!refusedForGood(err)) return; // try again later
        const refusal = { state: 'refused' as const, message: err.message };
        outcome = () => refusal;
      }
      const ids = new Set(pending.map((l) => l.item.clientId));
      // Only the lines sent are marked: a tap made while the request was out stays pending.
      await writeLines(eventId, (lines) => {
        for (const [k, l] of Object.entries(lines)) if (ids.has(l.item.clientId)) lines[k] = { ...l, ...outcome(l.item.clientId) } as LocalLine;
        return lines;
      });
      changed();
    }
  } finally {
    sending.delete(eventId);
  }
}

/** Starts the send loop for a show; returns the function that stops it. */
export const startSendLoop = (eventId: number, everyMs = 5000): (() => void) => startOfflineSendLoop(() => flush(eventId), everyMs);
