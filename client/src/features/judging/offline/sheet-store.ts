import { createStore, get, setMany, update } from 'idb-keyval';
import type { JudgeView, NoteItem, ScoreItem } from '@shared/schemas/judging';

/**
 * Everything the judge writes lives here first, in IndexedDB, before any request: a reload or a
 * dead battery between a tap and a signal loses nothing. Each line is one record keyed by
 * car and criterion (or the car's comment); `state` says whether the server has it.
 */
export type LineState = 'pending' | 'sent' | 'refused' | 'replaced';
/** `answeredAt`: this phone's clock when the server answered, compared only with this phone's clock (when the view was fetched). */
type LineBase = { key: string; eventId: number; state: LineState; message?: string; answeredAt?: number };
export type LocalLine = (LineBase & { kind: 'score'; item: ScoreItem }) | (LineBase & { kind: 'note'; item: NoteItem });
/** A comment typed before the line has points waits here; it goes out with the points. */
export type CommentDraft = { key: string; comment: string };

const store = createStore('placard-judging', 'sheets');
const linesKey = (eventId: number) => `lines:${eventId}`;
const viewKey = (eventId: number) => `view:${eventId}`;

export { lineKey } from './line-key';

export async function readLines(eventId: number): Promise<Record<string, LocalLine>> {
  return (await get<Record<string, LocalLine>>(linesKey(eventId), store)) ?? {};
}

/** Writes lines in one IndexedDB transaction (read, change, write), so two taps never overwrite each other. */
export async function writeLines(eventId: number, change: (lines: Record<string, LocalLine>) => Record<string, LocalLine>): Promise<void> {
  await update<Record<string, LocalLine>>(linesKey(eventId), (old) => change({ ...(old ?? {}) }), store);
}

/** The last copy of the judge's cars and sheet fetched from the server, for opening the screens with no signal. */
export async function saveView(eventId: number, view: JudgeView, fetchedAt: number) {
  await setMany([[viewKey(eventId), view], [`${viewKey(eventId)}:at`, fetchedAt]], store);
}
export async function readView(eventId: number): Promise<{ view: JudgeView; fetchedAt: number } | undefined> {
  const view = await get<JudgeView>(viewKey(eventId), store);
  return view ? { view, fetchedAt: (await get<number>(`${viewKey(eventId)}:at`, store)) ?? 0 } : undefined;
}
