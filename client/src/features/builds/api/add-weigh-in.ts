import type { OwnerBuild, WeighInCreateInput } from '@shared/schemas/build';
import { api } from '@client/lib/api';
import { useBuildMutation } from './build-mutation';

export const addWeighIn = (id: number, input: WeighInCreateInput) => api<{ build: OwnerBuild }>(`/api/builds/${id}/weigh-ins`, { method: 'POST', body: input });

export const useAddWeighIn = (id: number) => useBuildMutation(id, (input: WeighInCreateInput) => addWeighIn(id, input));
