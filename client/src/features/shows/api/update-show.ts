import type { EventDetail, EventUpdateInput } from '@shared/schemas/show';
import { api } from '@client/lib/api';
import { useShowMutation } from './show-mutation';

export const updateShow = (id: number, input: EventUpdateInput) => api<{ event: EventDetail }>(`/api/events/${id}`, { method: 'PATCH', body: input });
export const useUpdateShow = (id: number) => useShowMutation(id, (input: EventUpdateInput) => updateShow(id, input));
