import type { ClassInput, EventClass } from '@shared/schemas/show-classes';
import { api } from '@client/lib/api';
import { useClassMutation } from './class-mutation';

export const createClass = (id: number, input: ClassInput) => api<{ class: EventClass }>(`/api/events/${id}/classes`, { method: 'POST', body: input });
export const useCreateClass = (id: number) => useClassMutation(id, (input: ClassInput) => createClass(id, input));
