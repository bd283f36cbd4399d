import { useMutation, useQueryClient } from '@tanstack/react-query';
import { showDayKeys } from './show-day-keys';

/** An organiser's action on one entry: the table and that entry's history refetch after it, done or failed. */
export function useEntryAction<I extends { entryId: number }, R>(eventId: number, send: (input: I) => Promise<R>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSettled: (_data, _err, input) =>
      Promise.all([qc.invalidateQueries({ queryKey: showDayKeys.entryTables(eventId) }), qc.invalidateQueries({ queryKey: showDayKeys.entryAudit(input.entryId) })]),
  });
}
