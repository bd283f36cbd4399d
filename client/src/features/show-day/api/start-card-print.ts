import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CardPrint } from '@shared/schemas/card-print';
import { api } from '@client/lib/api';
import { showDayKeys } from './show-day-keys';

export const startCardPrint = (eventId: number, classId: number | null) =>
  api<{ print: CardPrint }>(`/api/events/${eventId}/card-prints`, { method: 'POST', body: { classId } }).then((r) => r.print);

/** Starts a print (or gets the one already running) and shows it at once; polling takes over from there. */
export function useStartCardPrint(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (classId: number | null) => startCardPrint(eventId, classId),
    onSuccess: (print, classId) => qc.setQueryData(showDayKeys.cardPrint(eventId, classId), print),
  });
}
