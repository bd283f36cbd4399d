import { z } from 'zod';
import { EVENT_STATUSES } from '../constants';
import { EventLogoOutSchema, RefundRuleSchema, ShowWhenWhereOutSchema } from './show';
import { PublicResultsSchema } from './results';

/** The public face of a show: nothing about any person (no e-mail, phone, plate, VIN, home address). */
export const PublicEventSchema = z.object({
  id: z.number(),
  name: z.string(),
  slug: z.string(),
  url: z.string(),
  calendarUrl: z.string(),
  status: z.enum(EVENT_STATUSES),
  statusLabel: z.string(),
  logo: EventLogoOutSchema.nullable(),
  takingEntries: z.boolean(),
  /** People's choice voting is open: each car's page has the vote. */
  peoplesChoiceOpen: z.boolean(),
  ...ShowWhenWhereOutSchema.shape,
  venueAddress: z.string(),
  feeText: z.string(),
  /** The show's refund rule, written out by `refundRuleWords` on the page and the enter screen. */
  refundRule: RefundRuleSchema,
  description: z.string(),
  classes: z.array(
    z.object({
      id: z.number(),
      name: z.string(),
      description: z.string(),
      /** Places left, open offers counted as taken; null when neither the class nor the show sets a limit. */
      placesLeft: z.number().int().nullable(),
      // `arrived`: checked in at the gate (present only then), so visitors on the field know the car is there.
      entries: z.array(z.object({ number: z.number(), title: z.string(), url: z.string(), arrived: z.literal(true).optional() })),
    }),
  ),
  /** Published results (places, numbers, titles, rounded totals), or null before they are out. */
  results: PublicResultsSchema.nullable(),
});
export type PublicEvent = z.infer<typeof PublicEventSchema>;
