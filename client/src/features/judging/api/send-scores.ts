import type { z } from 'zod';
import type { ScoreSubmitInput, ScoreSubmitResultSchema } from '@shared/schemas/judging';
import { api } from '@client/lib/api';

/**
 * Sends a batch of the judge's scores and notes. No hook: the phone's outbox (offline/outbox.ts) calls it
 * from its send loop, outside React, and keeps the lines until the server has answered.
 */
export const sendScores = (eventId: number, input: ScoreSubmitInput) =>
  api<z.infer<typeof ScoreSubmitResultSchema>>(`/api/events/${eventId}/scores`, { method: 'POST', body: input });
