import { z } from 'zod';
import { calendarDate } from './dates';
import { requiredLine, requiredText } from './text';
import type { Photo } from './build';
import type { PublicAnswer } from './build-questions';

// The build log: dated posts on a build, drafts until the owner publishes them.

export const LOG_TITLE_MAX = 120;
export const LOG_BODY_MAX = 6000;
/** Photos one post may show (chosen from the build's own photos). */
export const LOG_PHOTOS_MAX = 6;
/** Posts the public build page shows; the rest are on the build's "all posts" page. */
export const LOG_POSTS_ON_PAGE = 3;
/** Posts in the Atom feed (the newest). */
export const LOG_POSTS_IN_FEED = 50;
export const LOG_STATUSES = ['draft', 'published'] as const;
export type LogStatus = (typeof LOG_STATUSES)[number];

const positiveId = z.number({ error: 'Use an id number.' }).int().positive().max(2_147_483_647);

export const LogPostCreateSchema = z.object({
  postedOn: calendarDate('Date'),
  title: requiredLine('Title', LOG_TITLE_MAX),
  body: requiredText('Text', LOG_BODY_MAX),
  status: z.enum(LOG_STATUSES, { error: 'Status is draft or published.' }).default('draft'),
  photoIds: z.array(positiveId).max(LOG_PHOTOS_MAX, { error: `A post shows at most ${LOG_PHOTOS_MAX} photos.` }).default([]),
  /** At most one measurement the post is about: a dyno run or a weigh-in of this build. */
  dynoRunId: positiveId.nullable().default(null),
  weighInId: positiveId.nullable().default(null),
}).refine((p) => p.dynoRunId === null || p.weighInId === null, { error: 'Link a dyno run or a weigh-in, not both.', path: ['weighInId'] });
export type LogPostCreateInput = z.infer<typeof LogPostCreateSchema>;

export const LogPostUpdateSchema = z.object({
  postedOn: calendarDate('Date').optional(),
  title: requiredLine('Title', LOG_TITLE_MAX).optional(),
  body: requiredText('Text', LOG_BODY_MAX).optional(),
  status: z.enum(LOG_STATUSES, { error: 'Status is draft or published.' }).optional(),
  photoIds: z.array(positiveId).max(LOG_PHOTOS_MAX, { error: `A post shows at most ${LOG_PHOTOS_MAX} photos.` }).optional(),
  dynoRunId: positiveId.nullable().optional(),
  weighInId: positiveId.nullable().optional(),
});
export type LogPostUpdateInput = z.infer<typeof LogPostUpdateSchema>;

/** What the owner's editor reads. */
export type OwnLogPost = {
  id: number;
  postedOn: string;
  title: string;
  body: string;
  status: LogStatus;
  photoIds: number[];
  dynoRunId: number | null;
  weighInId: number | null;
  updatedAt: string;
};

/** A measurement a public post links to, in words already chosen by the service (no ids). */
export type PublicLogMeasurement = { kind: 'dyno' | 'weigh-in'; date: string; anchor: string };

/** A published post as the public page, the "all posts" page and the feed show it. */
export type PublicLogPost = {
  id: number;
  postedOn: string;
  title: string;
  body: string;
  photos: Photo[];
  measurement: PublicLogMeasurement | null;
  updatedAt: string;
};

/** What the public page shows of the build over time: the newest posts, how many in all, and the answered questions. */
export type BuildOverTime = { posts: PublicLogPost[]; postCount: number; answers: PublicAnswer[] };
