import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EventRole } from '@shared/constants';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

/** One role of one person: someone who is both judge and steward loses only the role named. */
export type MemberRole = { userId: number; role: EventRole };

export const removeMember = (id: number, { userId, role }: MemberRole) => api<void>(`/api/events/${id}/members/${userId}/${role}`, { method: 'DELETE' });

export function useRemoveMember(id: number) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: (member: MemberRole) => removeMember(id, member), onSuccess: () => qc.invalidateQueries({ queryKey: showKeys.people(id) }) });
}
