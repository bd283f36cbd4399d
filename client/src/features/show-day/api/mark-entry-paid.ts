import type { AuditLine } from '@shared/schemas/entry';
import type { EntryTableRow } from '@shared/schemas/show-day';
import { api } from '@client/lib/api';
import { useEntryAction } from './entry-action';

export type MarkEntryPaidInput = { entryId: number; note: string };

export const markEntryPaid = ({ entryId, note }: MarkEntryPaidInput) =>
  api<{ entry: EntryTableRow; audit: AuditLine[] }>(`/api/entries/${entryId}/mark-paid`, { method: 'POST', body: { note } });

export const useMarkEntryPaid = (eventId: number) => useEntryAction(eventId, markEntryPaid);
