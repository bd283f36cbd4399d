import type { BuildOverTime, OwnLogPost, PublicLogPost } from '@shared/schemas/build-log';
import type { OwnQuestion, OwnQuestions, PublicAnswer } from '@shared/schemas/build-questions';
import type { BuildLogPost } from '../models/build-log-post';
import type { BuildQuestion } from '../models/build-question';
import type { Photo } from '../models/photo';
import { presentPhoto } from './photo';

export const presentOwnLogPost = (p: BuildLogPost): OwnLogPost => ({
  id: p.id,
  postedOn: p.postedOn,
  title: p.title,
  body: p.body,
  status: p.status,
  photoIds: [...p.photoIds],
  dynoRunId: p.dynoRunId,
  weighInId: p.weighInId,
  updatedAt: p.updatedAt.toISOString(),
});

/** A published post for anyone: its words, photos and the date of a linked measurement, which is already on the build page. */
export function presentPublicLogPost(entry: { post: BuildLogPost; photos: Photo[]; measurement: { kind: 'dyno' | 'weigh-in'; date: string } | null }): PublicLogPost {
  const { post, photos, measurement } = entry;
  return {
    id: post.id,
    postedOn: post.postedOn,
    title: post.title,
    body: post.body,
    photos: photos.map(presentPhoto),
    measurement: measurement ? { kind: measurement.kind, date: measurement.date, anchor: measurement.kind === 'dyno' ? 'dyno' : 'weigh-in' } : null,
    updatedAt: post.updatedAt.toISOString(),
  };
}

export const presentOwnQuestion = (q: BuildQuestion): OwnQuestion => ({
  id: q.id,
  question: q.question,
  answer: q.answer,
  askedCount: q.askedCount,
  fromVisitor: q.fromVisitor,
  askedAt: q.createdAt.toISOString(),
  answeredAt: q.answeredAt?.toISOString() ?? null,
});

export const presentOwnQuestions = (answered: BuildQuestion[], waiting: BuildQuestion[]): OwnQuestions => ({ answered: answered.map(presentOwnQuestion), waiting: waiting.map(presentOwnQuestion) });

/** An answered question for anyone: the words and how often it is asked; never who asked or when. */
export const presentPublicAnswer = (q: BuildQuestion): PublicAnswer => ({ question: q.question, answer: q.answer ?? '', askedCount: q.askedCount });

/** The public page's log and answers, from `loadPublicLogAndAnswers`. */
export const presentBuildOverTime = (loaded: { posts: Parameters<typeof presentPublicLogPost>[0][]; postCount: number; answers: BuildQuestion[] }): BuildOverTime => ({
  posts: loaded.posts.map(presentPublicLogPost),
  postCount: loaded.postCount,
  answers: loaded.answers.map(presentPublicAnswer),
});
