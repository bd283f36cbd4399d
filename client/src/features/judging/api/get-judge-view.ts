import { queryOptions, useQuery } from '@tanstack/react-query';
import type { JudgeView } from '@shared/schemas/judging';
import { api, ApiError } from '@client/lib/api';
import { readView, saveView } from '../offline/sheet-store';
import { judgingKeys } from './judging-keys';

/** `fetchedAt`: this phone's clock when the server's copy was read (compared with when its lines were answered). */
export type JudgeViewResult = { view: JudgeView; fromDevice: boolean; fetchedAt: number };

/** The judge's cars and sheet: from the server when there is a signal (and kept on the device), else the device's copy. */
export async function getJudgeView(eventId: number): Promise<JudgeViewResult> {
  try {
    const view = await api<JudgeView>(`/api/events/${eventId}/judging/mine`);
    const fetchedAt = Date.now();
    // Kept for opening with no signal; the screen does not wait for the write (a first one creates the database).
    void saveView(eventId, view, fetchedAt).catch(() => undefined);
    return { view, fromDevice: false, fetchedAt };
  } catch (err) {
    const kept = err instanceof ApiError && err.code === 'NETWORK' ? await readView(eventId) : undefined;
    if (kept) return { ...kept, fromDevice: true };
    throw err;
  }
}

export const judgeViewQueryOptions = (eventId: number) =>
  queryOptions({ queryKey: judgingKeys.mine(eventId), queryFn: () => getJudgeView(eventId), staleTime: 15_000, networkMode: 'always', retry: false });
export const useJudgeView = (eventId: number) => useQuery(judgeViewQueryOptions(eventId));
