import type { DynoRunFormInput, OwnerBuild } from '@shared/schemas/build';
import { api } from '@client/lib/api';
import { useBuildMutation } from './build-mutation';

/** The curve goes as rows or as the pasted CSV text; the server parses the CSV with the same shared parser. */
export const addDynoRun = (id: number, run: DynoRunFormInput) => api<{ build: OwnerBuild }>(`/api/builds/${id}/dyno-runs`, { method: 'POST', body: run });

export const useAddDynoRun = (id: number) => useBuildMutation(id, (run: DynoRunFormInput) => addDynoRun(id, run));
