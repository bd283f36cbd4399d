import { CARD_HIGHLIGHT_LABELS, type CardHighlight } from '@shared/schemas/card';
import { plainWords } from '@shared/build-log/light-format';
import type { CardHighlightWords } from '@templates/cards/content';
import { BuildLogPost } from '../../models/build-log-post';
import { BuildQuestion } from '../../models/build-question';
import { ValidationError } from '../../errors';
import { listAnsweredQuestions } from './build-questions';
import { listPublishedLogPosts } from './build-log';

/**
 * The words a card prints for the owner's chosen highlight, or null when there is none or it is no
 * longer public (a question taken off the page, a post back to draft): the card never prints what the page hides.
 */
export async function cardHighlightWords(buildId: number, highlight: CardHighlight | null | undefined): Promise<CardHighlightWords | null> {
  if (!highlight) return null;
  if (highlight.kind === 'question') {
    const q = await BuildQuestion.findOne({ where: { id: highlight.id, buildId } });
    return q?.answer ? { label: CARD_HIGHLIGHT_LABELS.question, heading: q.question.replace(/\s+/g, ' ').trim(), text: plainWords(q.answer) } : null;
  }
  const post = await BuildLogPost.findOne({ where: { id: highlight.id, buildId, status: 'published' } });
  return post ? { label: CARD_HIGHLIGHT_LABELS.log, heading: `${post.postedOn} · ${post.title}.`, text: plainWords(post.body) } : null;
}

/** A saved highlight must be one of this build's answered questions or published posts. */
export async function checkCardHighlight(buildId: number, highlight: CardHighlight | null | undefined): Promise<void> {
  if (highlight && !(await cardHighlightWords(buildId, highlight))) throw new ValidationError({ highlight: 'Choose one of this build’s answered questions or published posts.' });
}

/** What the designer offers: the answered questions (most asked first), then the published posts (newest first). */
export async function cardHighlightChoices(buildId: number): Promise<Array<CardHighlight & { label: string }>> {
  const [questions, posts] = await Promise.all([listAnsweredQuestions(buildId), listPublishedLogPosts(buildId)]);
  return [
    ...questions.map((q) => ({ kind: 'question' as const, id: q.id, label: `Question: ${q.question}` })),
    ...posts.map((p) => ({ kind: 'log' as const, id: p.id, label: `Log post: ${p.postedOn} · ${p.title}` })),
  ];
}
