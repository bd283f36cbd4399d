import type { ClassUpdateInput, EventClass } from '@shared/schemas/show-classes';
import { api } from '@client/lib/api';
import { useClassMutation } from './class-mutation';

export type UpdateClassInput = { classId: number; input: ClassUpdateInput };

export const updateClass = (id: number, { classId, input }: UpdateClassInput) => api<{ class: EventClass }>(`/api/events/${id}/classes/${classId}`, { method: 'PATCH', body: input });
export const useUpdateClass = (id: number) => useClassMutation(id, (change: UpdateClassInput) => updateClass(id, change));
