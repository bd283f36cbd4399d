import type { EventDetail } from '@shared/schemas/show';
import { api } from '@client/lib/api';
import { useShowMutation } from './show-mutation';

export function uploadShowLogo(id: number, file: File) {
  const body = new FormData();
  body.append('logo', file);
  return api<{ event: EventDetail }>(`/api/events/${id}/logo`, { method: 'POST', body });
}

export const useUploadShowLogo = (id: number) => useShowMutation(id, (file: File) => uploadShowLogo(id, file));
