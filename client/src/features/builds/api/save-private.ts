import type { BuildPrivate, OwnerBuild } from '@shared/schemas/build';
import { api } from '@client/lib/api';
import { useBuildMutation } from './build-mutation';

export const savePrivate = (id: number, input: BuildPrivate) => api<{ build: OwnerBuild }>(`/api/builds/${id}/private`, { method: 'PUT', body: input, keepalive: true });

export const useSavePrivate = (id: number) => useBuildMutation(id, (input: BuildPrivate) => savePrivate(id, input));
