import type { EventDetail } from '@shared/schemas/show';
import type { JudgingSheetInput } from '@shared/schemas/show-classes';
import { api } from '@client/lib/api';
import { useShowMutation } from './show-mutation';

export const saveJudgingSheet = (id: number, input: JudgingSheetInput) => api<{ event: EventDetail }>(`/api/events/${id}/criteria`, { method: 'PUT', body: input });
export const useSaveJudgingSheet = (id: number) => useShowMutation(id, (input: JudgingSheetInput) => saveJudgingSheet(id, input));
