import { z } from 'zod';
import { EVENT_STATUSES } from '../constants';
import { EventLogoOutSchema, RefundRuleSchema, ShowWhenWhereOutSchema } from './show';
import { PublicResultsSchema } from './results';
import { shortText } from './text';

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

/**
 * One page of the public show page's entry list (`/e/<slug>?q=&class=&page=`): a search in the titles
 * (or an entry number), one class, and a page of `PUBLIC_EVENT_ENTRIES_PER_PAGE` cars. The page costs
 * what it shows, whatever the size of the show.
 */
export const PUBLIC_EVENT_ENTRIES_PER_PAGE = 50;
export const PublicEventPageQuerySchema = z.object({
  q: shortText('Search', 80).default(''),
  // An empty choice from the form's "every class" means no narrowing.
  class: z.preprocess(
    (v) => (v === '' ? undefined : v),
    z.coerce.number({ error: 'Class must be a number from the list.' }).int({ error: 'Class must be a number from the list.' }).positive({ error: 'Class must be a number from the list.' }).max(2_147_483_647, { error: 'Class must be a number from the list.' }).optional(),
  ),
  page: z.coerce.number({ error: 'Page must be a number.' }).int({ error: 'Page must be a whole number.' }).min(1, { error: 'Page is at least 1.' }).max(10_000, { error: 'Page is at most 10000.' }).default(1),
});
export type PublicEventPageQuery = z.infer<typeof PublicEventPageQuerySchema>;

/** A car on one page of the list: its class, number, title and page. */
export type PublicEntryLine = { classId: number; number: number; title: string; url: string; arrived?: true };

/** The cars of one page, with the counts the class list and the pager need. */
export type PublicEntryListing = {
  query: PublicEventPageQuery;
  /** Confirmed cars per class id, whatever the search. */
  perClass: Record<number, number>;
  /** Cars matching the search and class, over every page. */
  total: number;
  pages: number;
  /** The class asked for is not one of this show's. */
  unknownClass: boolean;
  entries: PublicEntryLine[];
};
