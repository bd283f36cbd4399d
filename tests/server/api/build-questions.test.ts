import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiClient, type ApiClient } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { createFullBuild } from '../../support/build-factory';
import { listenApp } from '../../support/raw-http';
import { checkPageVersionOnEveryRequest } from '../../support/page-cache';
import { visitor } from '../../support/visitor';
import { config } from '@server/config';
import { BuildQuestion } from '@server/models/build-question';
import { QUESTION_INBOX_MAX } from '@shared/schemas/build-questions';

checkPageVersionOnEveryRequest();
let http: Awaited<ReturnType<typeof listenApp>>;
beforeAll(async () => {
  http = await listenApp();
});
afterAll(() => http.close());

async function signedIn(): Promise<{ client: ApiClient; userId: number }> {
  const { email, password, user } = await createUser();
  const client = await apiClient();
  expect((await client.signIn(email, password)).status).toBe(200);
  return { client, userId: user.id };
}

const qa = (over: Record<string, unknown> = {}) => ({ question: 'What are the wheels off?', answer: 'Nothing: they are made for it.', ...over });

describe('questions: the owner’s routes', () => {
  it('writes answered questions, lists them most asked first, edits and removes them', async () => {
    const { client, userId } = await signedIn();
    const build = await createFullBuild(userId);
    const base = `/api/builds/${build.id}/questions`;
    expect((await client.post(base, qa({ question: 'Is it drivable?', answer: 'Every weekend.', askedCount: 3 }))).status).toBe(201);
    const created = await client.post(base, qa({ askedCount: 12 }));
    expect(created.status).toBe(201);
    expect(created.body.questions.answered.map((q: { question: string }) => q.question)).toEqual(['What are the wheels off?', 'Is it drivable?']);
    expect(created.body.questions.waiting).toEqual([]);
    const id = created.body.questions.answered[0].id;
    const edited = await client.patch(`${base}/${id}`, { askedCount: 1 });
    expect(edited.body.questions.answered.map((q: { askedCount: number }) => q.askedCount)).toEqual([3, 1]);
    const removed = await client.delete(`${base}/${id}`);
    expect(removed.body.questions.answered).toHaveLength(1);
  });

  it('names the field it refuses', async () => {
    const { client, userId } = await signedIn();
    const build = await createFullBuild(userId);
    const res = await client.post(`/api/builds/${build.id}/questions`, { question: ' ', answer: 'a\u0007', askedCount: 0 });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['answer', 'askedCount', 'question']);
  });

  it('is the owner’s alone: another owner 404, anonymous 401', async () => {
    const { client, userId } = await signedIn();
    const build = await createFullBuild(userId);
    const id = (await client.post(`/api/builds/${build.id}/questions`, qa())).body.questions.answered[0].id;
    const { client: stranger } = await signedIn();
    expect((await stranger.get(`/api/builds/${build.id}/questions`)).status).toBe(404);
    expect((await stranger.post(`/api/builds/${build.id}/questions`, qa())).status).toBe(404);
    expect((await stranger.patch(`/api/builds/${build.id}/questions/${id}`, { answer: 'Taken' })).status).toBe(404);
    expect((await stranger.delete(`/api/builds/${build.id}/questions/${id}`)).status).toBe(404);
    const anonymous = await apiClient();
    expect((await anonymous.get(`/api/builds/${build.id}/questions`)).status).toBe(401);
    expect((await anonymous.patch(`/api/builds/${build.id}/questions/${id}`, { answer: 'x' })).status).toBe(401);
    expect((await client.get(`/api/builds/${build.id}/questions`)).body.questions.answered[0].answer).toBe('Nothing: they are made for it.');
  });
});

describe('a visitor’s question, from the public page without script', () => {
  it('waits in the owner’s inbox, then appears on the page once answered, most asked first', async () => {
    const { client, userId } = await signedIn();
    const build = await createFullBuild(userId);
    const phone = visitor(http.baseUrl);
    const page = await phone.view(build.code);
    // The form is on the page: a plain POST, the question box, the hidden honeypot; nothing about the visitor.
    expect(page.text).toContain(`action="/c/${build.code}/questions"`);
    expect(page.text).toMatch(/<textarea id="ask-q" name="question"/);
    expect(page.text).not.toMatch(/name="(email|name|phone)"/);

    const sent = await phone.ask(build.code, { question: 'Why the pushrods?', website: '' });
    expect(sent.status).toBe(303);
    expect(sent.headers.location).toBe(`/c/${build.code}/asked`);
    const thanks = await fetch(`${http.baseUrl}${sent.headers.location}`);
    expect(await thanks.text()).toContain('the owner has your question');

    // Not on the page while it waits.
    expect((await phone.view(build.code)).text).not.toContain('Why the pushrods?');
    const inbox = (await client.get(`/api/builds/${build.id}/questions`)).body.questions;
    expect(inbox.waiting).toEqual([expect.objectContaining({ question: 'Why the pushrods?', answer: null, fromVisitor: true })]);
    // Nothing but the words and the time is kept.
    const row = await BuildQuestion.findByPk(inbox.waiting[0].id, { raw: true });
    expect(Object.keys(row!).sort()).toEqual(['answer', 'answeredAt', 'askedCount', 'buildId', 'createdAt', 'fromVisitor', 'id', 'question', 'updatedAt']);
    expect(JSON.stringify(row)).not.toContain(phone.address);

    // Answering needs an answer.
    expect((await client.patch(`/api/builds/${build.id}/questions/${inbox.waiting[0].id}`, { askedCount: 2 })).status).toBe(400);
    await client.post(`/api/builds/${build.id}/questions`, qa({ askedCount: 1 }));
    const answered = await client.patch(`/api/builds/${build.id}/questions/${inbox.waiting[0].id}`, { answer: 'Room for the *wide* tyres.', askedCount: 4 });
    expect(answered.body.questions.waiting).toEqual([]);
    const html = (await phone.view(build.code)).text;
    const order = [...html.matchAll(/<dt>([^<]+)/g)].map((m) => m[1]);
    expect(order.indexOf('Why the pushrods?')).toBeLessThan(order.indexOf('What are the wheels off?'));
    expect(html).toContain('Room for the <em>wide</em> tyres.');
    expect(html).toContain('asked 4 times');
  });

  it('merges a question already answered under other words, and discards one', async () => {
    const { client, userId } = await signedIn();
    const build = await createFullBuild(userId);
    const answeredId = (await client.post(`/api/builds/${build.id}/questions`, qa())).body.questions.answered[0].id;
    const phone = visitor(http.baseUrl);
    await phone.ask(build.code, { question: 'What wheels are those?' });
    await phone.ask(build.code, { question: 'buy cheap watches' });
    const waiting = (await client.get(`/api/builds/${build.id}/questions`)).body.questions.waiting;
    const merged = await client.post(`/api/builds/${build.id}/questions/${waiting[0].id}/same-as`, { answeredId });
    expect(merged.body.questions.answered[0].askedCount).toBe(2);
    expect(merged.body.questions.waiting.map((q: { question: string }) => q.question)).toEqual(['buy cheap watches']);
    const discarded = await client.delete(`/api/builds/${build.id}/questions/${waiting[1].id}`);
    expect(discarded.body.questions.waiting).toEqual([]);
    expect((await phone.view(build.code)).text).not.toContain('buy cheap watches');
  });

  it('keeps nothing when the honeypot is filled, yet answers as for a person', async () => {
    const { client, userId } = await signedIn();
    const build = await createFullBuild(userId);
    const robot = visitor(http.baseUrl);
    const res = await robot.ask(build.code, { question: 'Great car, visit my site', website: 'http://spam.example' });
    expect(res.status).toBe(303);
    expect(res.headers.location).toBe(`/c/${build.code}/asked`);
    // A control: a person's question sent after it arrives, and the robot's is not there.
    await visitor(http.baseUrl).ask(build.code, { question: 'Control question' });
    const waiting = (await client.get(`/api/builds/${build.id}/questions`)).body.questions.waiting;
    expect(waiting.map((q: { question: string }) => q.question)).toEqual(['Control question']);
  });

  it('refuses an empty question, one with a control character, or too long, in words with the form again', async () => {
    const { userId } = await signedIn();
    const build = await createFullBuild(userId);
    const phone = visitor(http.baseUrl);
    const empty = await phone.ask(build.code, { question: '   ' });
    expect(empty.status).toBe(400);
    expect(empty.text).toContain('Your question is required.');
    expect(empty.text).toContain(`action="/c/${build.code}/questions"`);
    expect((await phone.ask(build.code, { question: 'bell\u0007' })).text).toContain('a character we cannot keep');
    expect((await phone.ask(build.code, { question: 'x'.repeat(301) })).text).toContain('at most 300 characters');
  });

  it('limits questions per address, refused ones included, with a page in words', async () => {
    const { userId } = await signedIn();
    const build = await createFullBuild(userId);
    const phone = visitor(http.baseUrl);
    const other = visitor(http.baseUrl);
    for (let i = 0; i < config.questionRateLimit; i++) expect((await phone.ask(build.code, { question: i === 0 ? '' : `Question ${i}` })).status).toBeLessThan(429);
    const refused = await phone.ask(build.code, { question: 'One too many' });
    expect(refused.status).toBe(429);
    expect(refused.text).toContain('Many questions came from this network');
    // Another address is not held back.
    expect((await other.ask(build.code, { question: 'From another phone' })).status).toBe(303);
  });

  it('refuses once the inbox is full, and for a draft or unknown build answers 404', async () => {
    const { userId } = await signedIn();
    const build = await createFullBuild(userId);
    await BuildQuestion.bulkCreate(Array.from({ length: QUESTION_INBOX_MAX }, (_, i) => ({ buildId: build.id, question: `Q${i}`, fromVisitor: true, answer: null, answeredAt: null })));
    const full = await visitor(http.baseUrl).ask(build.code, { question: 'One more' });
    expect(full.status).toBe(409);
    expect(full.text).toContain('many questions waiting');
    const draft = await createFullBuild(userId, { published: false });
    expect((await visitor(http.baseUrl).ask(draft.code, { question: 'Hello?' })).status).toBe(404);
    expect((await visitor(http.baseUrl).ask('ZZZZZZZ', { question: 'Hello?' })).status).toBe(404);
    expect(await BuildQuestion.count({ where: { buildId: draft.id } })).toBe(0);
  });
});


