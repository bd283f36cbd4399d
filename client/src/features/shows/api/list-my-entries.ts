import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MyEntry } from '@shared/schemas/entry';
import { api } from '@client/lib/api';
import { entryKeys } from './show-keys';

export const listMyEntries = () => api<{ entries: MyEntry[] }>('/api/entries');
export const myEntriesQueryOptions = () => queryOptions({ queryKey: entryKeys.mine(), queryFn: listMyEntries });
/** While an entry just paid waits for the payment service's confirmation, ask again every two seconds. */
export const useMyEntries = (awaitingPaidId: number | null = null) =>
  useQuery({
    ...myEntriesQueryOptions(),
    refetchInterval: (q) => (awaitingPaidId && !q.state.data?.entries.find((e) => e.id === awaitingPaidId)?.paidAt ? 2000 : false),
  });
