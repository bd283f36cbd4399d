import type { EventDetail } from '@shared/schemas/show';
import type { EventAction } from '@shared/event-lifecycle';
import { api } from '@client/lib/api';
import { useShowMutation } from './show-mutation';

/** `acknowledgeWarnings`: publishing results after the organiser was shown the review's warnings. */
export type StepRequest = { action: EventAction; acknowledgeWarnings?: boolean };
export const takeStep = (id: number, step: StepRequest) => api<{ event: EventDetail }>(`/api/events/${id}/lifecycle`, { method: 'POST', body: step });
export const useTakeStep = (id: number) => useShowMutation(id, (step: StepRequest) => takeStep(id, step));
