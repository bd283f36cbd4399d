import { queryOptions, useQuery } from '@tanstack/react-query';
import type { JudgeView } from '@shared/schemas/judging';
import { api, ApiError } from '@client/lib/api';
import { readView, saveView } from '../offline/sheet-store';
import { judgingKeys } from './judging-keys';

export type JudgeViewResult = { view: JudgeView; fromDevice: boolean };

/** The judge's cars and sheet: from the server when there is a signal (and kept on the device), else the device's copy. */
export async function getJudgeView(eventId: number): Promise<JudgeViewResult> {
  try {
    const view = await api<JudgeView>(`/api/events/${eventId}/judging/mine`);
    await saveView(eventId, view);
    return { view, fromDevice: false };
  } catch (err) {
    const kept = err instanceof ApiError && err.code === 'NETWORK' ? await readView(eventId) : undefined;
    if (kept) return { view: kept, fromDevice: true };
    throw err;
  }
}

export const judgeViewQueryOptions = (eventId: number) =>
  queryOptions({ queryKey: judgingKeys.mine(eventId), queryFn: () => getJudgeView(eventId), staleTime: 15_000, networkMode: 'always', retry: false });
export const useJudgeView = (eventId: number) => useQuery(judgeViewQueryOptions(eventId));
