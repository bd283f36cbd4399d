import { useMutation } from '@tanstack/react-query';
import { api } from '@client/lib/api';

/** Queues the show reminder (each confirmed entrant's card attached); answers how many entrants it goes to. */
export const sendReminders = (eventId: number) => api<{ entrants: number }>(`/api/events/${eventId}/reminders`, { method: 'POST' });

export const useSendReminders = (eventId: number) => useMutation({ mutationFn: () => sendReminders(eventId) });
