import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ClassInput, ClassUpdateInput, EventClass } from '@shared/schemas/show-classes';
import { api } from '@client/lib/api';
import { showQueryKey } from './get-show';

type Save = { classId?: number; input: ClassInput | ClassUpdateInput };
export const saveClass = (id: number, { classId, input }: Save) =>
  classId
    ? api<{ class: EventClass }>(`/api/events/${id}/classes/${classId}`, { method: 'PATCH', body: input })
    : api<{ class: EventClass }>(`/api/events/${id}/classes`, { method: 'POST', body: input });
export const deleteClass = (id: number, classId: number) => api<void>(`/api/events/${id}/classes/${classId}`, { method: 'DELETE' });

export function useSaveClass(id: number) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: (save: Save) => saveClass(id, save), onSuccess: () => qc.invalidateQueries({ queryKey: showQueryKey(id) }) });
}
export function useDeleteClass(id: number) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: (classId: number) => deleteClass(id, classId), onSuccess: () => qc.invalidateQueries({ queryKey: showQueryKey(id) }) });
}
