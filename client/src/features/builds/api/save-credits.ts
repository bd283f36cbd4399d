import type { Credit, OwnerBuild } from '@shared/schemas/build';
import { api } from '@client/lib/api';
import { useBuildMutation } from './build-mutation';

export const saveCredits = (id: number, credits: Credit[]) => api<{ build: OwnerBuild }>(`/api/builds/${id}/credits`, { method: 'PUT', body: { credits }, keepalive: true });

export const useSaveCredits = (id: number) => useBuildMutation(id, (input: { credits: Credit[] }) => saveCredits(id, input.credits));
