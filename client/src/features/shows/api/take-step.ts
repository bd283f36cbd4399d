import type { EventDetail } from '@shared/schemas/show';
import type { EventAction } from '@shared/event-lifecycle';
import { api } from '@client/lib/api';
import { useShowMutation } from './show-mutation';

export const takeStep = (id: number, action: EventAction) => api<{ event: EventDetail }>(`/api/events/${id}/lifecycle`, { method: 'POST', body: { action } });
export const useTakeStep = (id: number) => useShowMutation(id, (action: EventAction) => takeStep(id, action));
