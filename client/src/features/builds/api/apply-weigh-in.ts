import type { OwnerBuild } from '@shared/schemas/build';
import { api } from '@client/lib/api';
import { useBuildMutation } from './build-mutation';

/** The weigh-in's total becomes the build's measured weight. */
export const applyWeighIn = (id: number, weighInId: number) => api<{ build: OwnerBuild }>(`/api/builds/${id}/weigh-ins/${weighInId}/apply`, { method: 'POST' });

export const useApplyWeighIn = (id: number) => useBuildMutation(id, (weighInId: number) => applyWeighIn(id, weighInId));
