import type { GateSyncInput, GateSyncResult } from '@shared/schemas/show-day';
import { api } from '@client/lib/api';

/** Sends check-ins queued on the phone; the server applies each once and answers for each. */
export const sendGateCheckIns = (eventId: number, input: GateSyncInput) => api<{ results: GateSyncResult[] }>(`/api/events/${eventId}/gate/sync`, { method: 'POST', body: input });
