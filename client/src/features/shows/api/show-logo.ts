import type { EventDetail } from '@shared/schemas/show';
import { api } from '@client/lib/api';
import { useShowMutation } from './show-mutation';

function uploadLogo(id: number, file: File) {
  const body = new FormData();
  body.append('logo', file);
  return api<{ event: EventDetail }>(`/api/events/${id}/logo`, { method: 'POST', body });
}

export const useUploadShowLogo = (id: number) => useShowMutation(id, (file: File) => uploadLogo(id, file));
export const useRemoveShowLogo = (id: number) => useShowMutation(id, () => api<{ event: EventDetail }>(`/api/events/${id}/logo`, { method: 'DELETE' }));
