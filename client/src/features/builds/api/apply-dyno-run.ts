import type { OwnerBuild } from '@shared/schemas/build';
import { api } from '@client/lib/api';
import { useBuildMutation } from './build-mutation';

/** The run's peaks become the engine's measured power and torque. */
export const applyDynoRun = (id: number, runId: number) => api<{ build: OwnerBuild }>(`/api/builds/${id}/dyno-runs/${runId}/apply`, { method: 'POST' });

export const useApplyDynoRun = (id: number) => useBuildMutation(id, (runId: number) => applyDynoRun(id, runId));
