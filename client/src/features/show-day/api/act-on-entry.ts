import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AuditLine } from '@shared/schemas/entry';
import type { EntryTableRow } from '@shared/schemas/show-day';
import { api } from '@client/lib/api';
import { showDayKeys } from './show-day-keys';

export type EntryActionInput =
  | { kind: 'class'; entryId: number; classId: number }
  | { kind: 'mark-paid'; entryId: number; note: string }
  | { kind: 'move-up'; entryId: number }
  | { kind: 'withdraw'; entryId: number };

/** One organiser action on an entry; the table and the entry's history refetch after it. */
export function actOnEntry(input: EntryActionInput) {
  const path = `/api/entries/${input.entryId}/${input.kind}`;
  if (input.kind === 'class') return api<{ entry: EntryTableRow; audit: AuditLine[] }>(path, { method: 'POST', body: { classId: input.classId } });
  if (input.kind === 'mark-paid') return api<{ entry: EntryTableRow; audit: AuditLine[] }>(path, { method: 'POST', body: { note: input.note } });
  return api<unknown>(path, { method: 'POST' });
}

export function useActOnEntry(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: actOnEntry,
    onSettled: (_d, _e, input) => Promise.all([qc.invalidateQueries({ queryKey: showDayKeys.entryTables(eventId) }), qc.invalidateQueries({ queryKey: showDayKeys.entryAudit(input.entryId) })]),
  });
}
