import { api } from '@client/lib/api';
import { useClassMutation } from './class-mutation';

export const deleteClass = (id: number, classId: number) => api<void>(`/api/events/${id}/classes/${classId}`, { method: 'DELETE' });
export const useDeleteClass = (id: number) => useClassMutation(id, (classId: number) => deleteClass(id, classId));
