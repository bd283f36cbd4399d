import type { OwnerBuild } from '@shared/schemas/build';
import { api } from '@client/lib/api';
import { useBuildMutation } from './build-mutation';

export const setPublished = (id: number, published: boolean) => api<{ build: OwnerBuild }>(`/api/builds/${id}/published`, { method: 'PUT', body: { published } });

export const useSetPublished = (id: number) => useBuildMutation(id, (published: boolean) => setPublished(id, published));
