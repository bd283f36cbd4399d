import { useMutation } from '@tanstack/react-query';
import { api } from '@client/lib/api';

export const startEntryCheckout = (entryId: number) => api<{ url: string }>(`/api/entries/${entryId}/checkout`, { method: 'POST' });

/** Opens (or reopens) the payment service's checkout for an entry's fee; the browser then goes there. */
export function usePayEntry() {
  return useMutation({ mutationFn: startEntryCheckout, onSuccess: ({ url }) => window.location.assign(url) });
}
