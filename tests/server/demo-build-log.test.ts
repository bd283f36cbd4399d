import { describe, expect, it } from 'vitest';
import { LogPostCreateSchema } from '@shared/schemas/build-log';
import { QuestionCreateSchema, VisitorQuestionSchema } from '@shared/schemas/build-questions';
import { DEMO_ANSWERS, DEMO_LOG_POSTS, DEMO_WAITING_QUESTION } from '@server/db/demo/build-log';

describe('the demo build’s log and questions', () => {
  it('has a dozen published posts across two years, a draft, six answers and one question waiting, all valid input', () => {
    const published = DEMO_LOG_POSTS.filter((p) => !p.draft);
    expect(published).toHaveLength(12);
    const days = published.map((p) => Date.parse(p.postedOn)).sort((a, b) => a - b);
    expect((days.at(-1)! - days[0]!) / 86_400_000).toBeGreaterThan(700);
    expect(DEMO_LOG_POSTS.filter((p) => p.draft)).toHaveLength(1);
    for (const p of DEMO_LOG_POSTS) expect(LogPostCreateSchema.safeParse({ postedOn: p.postedOn, title: p.title, body: p.body }).success, p.title).toBe(true);
    expect(DEMO_ANSWERS).toHaveLength(6);
    for (const a of DEMO_ANSWERS) expect(QuestionCreateSchema.safeParse(a).success, a.question).toBe(true);
    expect(VisitorQuestionSchema.safeParse({ question: DEMO_WAITING_QUESTION }).success).toBe(true);
    // Invented words only: no addresses, e-mails or phone numbers in what the page shows.
    const words = JSON.stringify([DEMO_LOG_POSTS, DEMO_ANSWERS, DEMO_WAITING_QUESTION]);
    expect(words).not.toMatch(/@|https?:\/\/|\+?\d{3}[ -]\d{3,4}[ -]\d{4}/);
  });
});
