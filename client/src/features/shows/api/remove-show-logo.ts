import type { EventDetail } from '@shared/schemas/show';
import { api } from '@client/lib/api';
import { useShowMutation } from './show-mutation';

export const removeShowLogo = (id: number) => api<{ event: EventDetail }>(`/api/events/${id}/logo`, { method: 'DELETE' });
export const useRemoveShowLogo = (id: number) => useShowMutation(id, () => removeShowLogo(id));
