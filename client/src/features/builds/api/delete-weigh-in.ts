import type { OwnerBuild } from '@shared/schemas/build';
import { api } from '@client/lib/api';
import { useBuildMutation } from './build-mutation';

export const deleteWeighIn = (id: number, weighInId: number) => api<{ build: OwnerBuild }>(`/api/builds/${id}/weigh-ins/${weighInId}`, { method: 'DELETE' });

export const useDeleteWeighIn = (id: number) => useBuildMutation(id, (weighInId: number) => deleteWeighIn(id, weighInId));
