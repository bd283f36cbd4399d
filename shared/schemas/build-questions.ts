import { z } from 'zod';
import { requiredText, text } from './text';

// Questions visitors ask about a build, answered once by the owner.

export const QUESTION_MAX = 300;
export const ANSWER_MAX = 2000;
/** Questions waiting in one build's inbox; past this a visitor is told the inbox is full. */
export const QUESTION_INBOX_MAX = 100;
/** The honeypot's field name in the visitor's form: hidden from people, filled by careless robots. */
export const QUESTION_HONEYPOT = 'website';
export const ASKED_COUNT_MAX = 9999;

const askedCount = z.number({ error: 'Times asked must be a number.' }).int({ error: 'Times asked must be a whole number.' }).min(1, { error: 'Times asked is at least 1.' }).max(ASKED_COUNT_MAX, { error: `Times asked is at most ${ASKED_COUNT_MAX}.` });

/** The owner writes a question people ask, with its answer. */
export const QuestionCreateSchema = z.object({
  question: requiredText('Question', QUESTION_MAX),
  answer: requiredText('Answer', ANSWER_MAX),
  askedCount: askedCount.default(1),
});
export type QuestionCreateInput = z.infer<typeof QuestionCreateSchema>;

/** Answering a waiting question, or editing an answered one. */
export const QuestionUpdateSchema = z.object({
  question: requiredText('Question', QUESTION_MAX).optional(),
  answer: requiredText('Answer', ANSWER_MAX).optional(),
  askedCount: askedCount.optional(),
});
export type QuestionUpdateInput = z.infer<typeof QuestionUpdateSchema>;

/** A waiting question that is one already answered: it adds one to that answer's count and leaves the inbox. */
export const QuestionSameAsSchema = z.object({ answeredId: z.number({ error: 'Choose the answered question.' }).int().positive().max(2_147_483_647) });

/**
 * The visitor's form, posted without script. The honeypot is read as any text (it is never stored):
 * when it holds something, the question is quietly dropped.
 */
export const VisitorQuestionSchema = z.object({
  question: requiredText('Your question', QUESTION_MAX),
  [QUESTION_HONEYPOT]: text('Leave this empty').max(500).optional(),
});

export type OwnQuestion = { id: number; question: string; answer: string | null; askedCount: number; fromVisitor: boolean; askedAt: string; answeredAt: string | null };
export type OwnQuestions = { answered: OwnQuestion[]; waiting: OwnQuestion[] };
export type PublicAnswer = { question: string; answer: string; askedCount: number };
