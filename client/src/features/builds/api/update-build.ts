import type { BuildUpdateInput, OwnerBuild } from '@shared/schemas/build';
import { api } from '@client/lib/api';
import { useBuildMutation } from './build-mutation';

/** The overview: title, model year, body origin, style, story and the build's weight. */
export const updateBuild = (id: number, input: BuildUpdateInput) => api<{ build: OwnerBuild }>(`/api/builds/${id}`, { method: 'PATCH', body: input, keepalive: true });

export const useUpdateBuild = (id: number) => useBuildMutation(id, (input: BuildUpdateInput) => updateBuild(id, input));
