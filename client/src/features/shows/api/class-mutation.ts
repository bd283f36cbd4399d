import { useMutation, useQueryClient } from '@tanstack/react-query';
import { showKeys } from './show-keys';

/** A change to a show's classes: the show's answer carries them, so the show refetches. */
export function useClassMutation<I, R>(id: number, send: (input: I) => Promise<R>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: send, onSuccess: () => qc.invalidateQueries({ queryKey: showKeys.detail(id) }) });
}
