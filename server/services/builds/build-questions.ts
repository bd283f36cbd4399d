import { Op, type Transaction } from 'sequelize';
import type { QuestionCreateInput, QuestionUpdateInput } from '@shared/schemas/build-questions';
import { QUESTION_INBOX_MAX } from '@shared/schemas/build-questions';
import { BuildQuestion } from '../../models/build-question';
import type { Build } from '../../models/build';
import { ConflictError, NotFoundError, ValidationError } from '../../errors';
import { withTransaction } from '../../db/transaction';
import { lockBuild } from './builds';

/** Answered questions, the most asked first (then the newest answer): the order of the page and the editor. */
export const listAnsweredQuestions = (buildId: number, transaction?: Transaction) =>
  BuildQuestion.findAll({
    where: { buildId, answeredAt: { [Op.ne]: null } },
    order: [
      ['askedCount', 'DESC'],
      ['answeredAt', 'DESC'],
      ['id', 'DESC'],
    ],
    transaction,
  });

/** The owner's inbox: visitors' questions not answered yet, oldest first. */
export const listWaitingQuestions = (buildId: number, transaction?: Transaction) =>
  BuildQuestion.findAll({ where: { buildId, answeredAt: null }, order: [['createdAt', 'ASC'], ['id', 'ASC']], transaction });

export async function findQuestion(build: Build, questionId: number, transaction?: Transaction): Promise<BuildQuestion> {
  const q = await BuildQuestion.findOne({ where: { id: questionId, buildId: build.id }, transaction });
  if (!q) throw new NotFoundError('No such question on this build.');
  return q;
}

/** The owner writes a question people ask, answered at once. */
export async function createAnsweredQuestion(build: Build, input: QuestionCreateInput, outer?: Transaction): Promise<BuildQuestion> {
  return withTransaction(outer, async (transaction) => {
    await lockBuild(build.id, transaction);
    return BuildQuestion.create({ buildId: build.id, question: input.question, answer: input.answer, askedCount: input.askedCount, answeredAt: new Date() }, { transaction });
  });
}

/** Answers a waiting question or edits an answered one; a waiting question needs its answer before anything else. */
export async function updateQuestion(build: Build, questionId: number, input: QuestionUpdateInput, outer?: Transaction): Promise<BuildQuestion> {
  return withTransaction(outer, async (transaction) => {
    await lockBuild(build.id, transaction);
    const q = await findQuestion(build, questionId, transaction);
    if (q.answer === null && input.answer === undefined) throw new ValidationError({ answer: 'Answer is required.' });
    await q.update(
      {
        ...(input.question !== undefined ? { question: input.question } : {}),
        ...(input.answer !== undefined ? { answer: input.answer } : {}),
        ...(input.askedCount !== undefined ? { askedCount: input.askedCount } : {}),
        ...(q.answeredAt === null ? { answeredAt: new Date() } : {}),
      },
      { transaction },
    );
    return q;
  });
}

/** A waiting question already answered under another wording: that answer counts one more asking, and this one leaves the inbox. */
export async function markSameAs(build: Build, questionId: number, answeredId: number, outer?: Transaction): Promise<void> {
  await withTransaction(outer, async (transaction) => {
    await lockBuild(build.id, transaction);
    const waiting = await findQuestion(build, questionId, transaction);
    if (waiting.answer !== null) throw new ConflictError('That question is already answered.');
    const answered = await BuildQuestion.findOne({ where: { id: answeredId, buildId: build.id }, transaction });
    if (!answered || answered.answer === null) throw new ValidationError({ answeredId: 'Choose one of this build’s answered questions.' });
    await answered.increment('askedCount', { transaction });
    await waiting.destroy({ transaction });
  });
}

/** Discards a waiting question, or takes an answered one off the page. */
export async function deleteQuestion(build: Build, questionId: number, outer?: Transaction): Promise<void> {
  await withTransaction(outer, async (transaction) => {
    await lockBuild(build.id, transaction);
    await (await findQuestion(build, questionId, transaction)).destroy({ transaction });
  });
}

/**
 * A visitor's question joins the inbox, unless the inbox is full (then false). The build row is
 * locked so the count and the insert cannot interleave with another visitor's.
 */
export async function receiveVisitorQuestion(buildId: number, question: string, outer?: Transaction): Promise<boolean> {
  return withTransaction(outer, async (transaction) => {
    await lockBuild(buildId, transaction);
    const waiting = await BuildQuestion.count({ where: { buildId, answeredAt: null }, transaction });
    if (waiting >= QUESTION_INBOX_MAX) return false;
    await BuildQuestion.create({ buildId, question, fromVisitor: true, answer: null, answeredAt: null }, { transaction });
    return true;
  });
}
