import { queryOptions, useQuery } from '@tanstack/react-query';
import type { GateRoster } from '@shared/schemas/show-day';
import { api, ApiError } from '@client/lib/api';
import { readRoster, saveRoster } from '../offline/gate-store';
import { showDayKeys } from './show-day-keys';

/** The show's entries for the gate: from the server when there is a signal (and kept on the phone), else the phone's copy. */
export const gateRosterQueryOptions = (eventId: number) =>
  queryOptions({
    queryKey: showDayKeys.gateRoster(eventId),
    queryFn: async (): Promise<GateRoster> => {
      try {
        const roster = await api<GateRoster>(`/api/events/${eventId}/gate/roster`);
        await saveRoster(roster);
        return roster;
      } catch (err) {
        const kept = err instanceof ApiError && err.code === 'NETWORK' ? await readRoster(eventId) : undefined;
        if (kept) return kept;
        throw err;
      }
    },
    refetchInterval: 30_000,
    networkMode: 'always',
  });

/** `enabled`: only where the gate is open (or the show could not be read, e.g. with no signal), so a closed gate asks nothing. */
export const useGateRoster = (eventId: number, enabled: boolean) => useQuery({ ...gateRosterQueryOptions(eventId), enabled });
