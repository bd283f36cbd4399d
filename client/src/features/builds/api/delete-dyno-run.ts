import type { OwnerBuild } from '@shared/schemas/build';
import { api } from '@client/lib/api';
import { useBuildMutation } from './build-mutation';

export const deleteDynoRun = (id: number, runId: number) => api<{ build: OwnerBuild }>(`/api/builds/${id}/dyno-runs/${runId}`, { method: 'DELETE' });

export const useDeleteDynoRun = (id: number) => useBuildMutation(id, (runId: number) => deleteDynoRun(id, runId));
