import type { AuditLine } from '@shared/schemas/entry';
import type { EntryTableRow } from '@shared/schemas/show-day';
import { api } from '@client/lib/api';
import { useEntryAction } from './entry-action';

export type ChangeEntryClassInput = { entryId: number; classId: number };

export const changeEntryClass = ({ entryId, classId }: ChangeEntryClassInput) =>
  api<{ entry: EntryTableRow; audit: AuditLine[] }>(`/api/entries/${entryId}/class`, { method: 'POST', body: { classId } });

export const useChangeEntryClass = (eventId: number) => useEntryAction(eventId, changeEntryClass);
