import { sheetState, type SheetState } from '@shared/judging/sheet-state';
import type { JudgeView, MyNote, MyScore } from '@shared/schemas/judging';
import { REPLACED_ON_OTHER_PHONE } from './device';
import { lineKey } from './line-key';
import type { LineState, LocalLine } from './sheet-store';

export type LineView = { points: number | null; comment: string; state: LineState | 'server' | 'empty'; message?: string };
export type CarSheet = { lines: Record<number, LineView>; note: LineView; state: SheetState; unsent: number; refused: string[]; replaced: number };

/**
 * Which copy of a line the judge sees. The server decides the order, so its copy wins unless this
 * phone holds something newer it has not heard back about: a line still pending, or one answered after
 * the server's copy was read. A line answered before the copy was read, now held from another phone of
 * the judge, was changed there later: the server's value shows, marked as replaced.
 */
/** What the merge needs to know about this phone: its id, and its clock when the server's copy was read. */
export type SheetContext = { deviceId: string; fetchedAt: number };

function pick(local: LocalLine | undefined, server: MyScore | MyNote | undefined, { deviceId, fetchedAt }: SheetContext): 'local' | 'server' | 'replaced' {
  if (!local || local.state === 'refused') return 'server';
  if (local.state === 'replaced') return 'replaced';
  if (local.state === 'pending' || !server || server.clientId === local.item.clientId) return 'local';
  const answeredBeforeRead = (local.answeredAt ?? Infinity) < fetchedAt;
  return answeredBeforeRead && server.deviceId !== deviceId ? 'replaced' : 'local';
}

/** One car's sheet as the judge sees it: the server's copy and the device's lines, merged as `pick` says. */
export function carSheet(view: JudgeView, lines: Record<string, LocalLine>, entryId: number, context: SheetContext): CarSheet {
  const out: Record<number, LineView> = {};
  let unsent = 0;
  let replaced = 0;
  const refused: string[] = [];
  const merge = (local: LocalLine | undefined, server: MyScore | MyNote | undefined, serverPoints: number | null): LineView => {
    if (local?.state === 'pending') unsent++;
    if (local?.state === 'refused' && local.message) refused.push(local.message);
    const choice = pick(local, server, context);
    if (choice === 'local' && local) return { points: local.kind === 'score' ? local.item.points : null, comment: local.item.comment, state: local.state };
    if (!server) return { points: null, comment: '', state: 'empty' };
    if (choice === 'replaced') {
      replaced++;
      return { points: serverPoints, comment: server.comment, state: 'replaced', message: REPLACED_ON_OTHER_PHONE };
    }
    return { points: serverPoints, comment: server.comment, state: 'server' };
  };
  for (const c of view.criteria) {
    const server = view.scores.find((s) => s.entryId === entryId && s.criterionId === c.id);
    out[c.id] = merge(lines[lineKey(entryId, c.id)], server, server?.points ?? null);
  }
  const note = merge(lines[lineKey(entryId, 'note')], view.notes.find((n) => n.entryId === entryId), null);
  const scored = Object.values(out).filter((l) => l.points !== null).length;
  return { lines: out, note, state: sheetState(scored, view.criteria.length), unsent, refused: [...new Set(refused)], replaced };
}
