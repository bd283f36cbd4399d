import { sheetState, type SheetState } from '@shared/judging/sheet-state';
import type { JudgeView } from '@shared/schemas/judging';
import { lineKey, type LineState, type LocalLine } from './sheet-store';

export type LineView = { points: number | null; comment: string; state: LineState | 'server' | 'empty'; message?: string };
export type CarSheet = { lines: Record<number, LineView>; note: LineView; state: SheetState; unsent: number; refused: string[] };

const newer = (a: string | undefined, b: string | undefined) => (a ?? '') > (b ?? '');

/** One car's sheet as the judge sees it: the server's copy and the device's lines, the newer of each winning, as the server decides too. */
export function carSheet(view: JudgeView, lines: Record<string, LocalLine>, entryId: number): CarSheet {
  const out: Record<number, LineView> = {};
  let unsent = 0;
  const refused: string[] = [];
  for (const c of view.criteria) {
    const server = view.scores.find((s) => s.entryId === entryId && s.criterionId === c.id);
    const local = lines[lineKey(entryId, c.id)];
    if (local?.kind === 'score' && local.state !== 'refused' && newer(local.item.deviceTime, server?.deviceTime)) {
      out[c.id] = { points: local.item.points, comment: local.item.comment, state: local.state };
    } else if (server) out[c.id] = { points: server.points, comment: server.comment, state: 'server' };
    else out[c.id] = { points: null, comment: '', state: 'empty' };
    if (local?.state === 'pending') unsent++;
    if (local?.state === 'refused' && local.message) refused.push(local.message);
  }
  const serverNote = view.notes.find((n) => n.entryId === entryId);
  const localNote = lines[lineKey(entryId, 'note')];
  let note: LineView = serverNote ? { points: null, comment: serverNote.comment, state: 'server' } : { points: null, comment: '', state: 'empty' };
  if (localNote?.kind === 'note' && localNote.state !== 'refused' && newer(localNote.item.deviceTime, serverNote?.deviceTime)) note = { points: null, comment: localNote.item.comment, state: localNote.state };
  if (localNote?.state === 'pending') unsent++;
  if (localNote?.state === 'refused' && localNote.message) refused.push(localNote.message);
  const scored = Object.values(out).filter((l) => l.points !== null).length;
  return { lines: out, note, state: sheetState(scored, view.criteria.length), unsent, refused: [...new Set(refused)] };
}
