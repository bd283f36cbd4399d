import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { apiClient } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { createFullBuild } from '../../support/build-factory';
import { pdfText } from '../../support/pdf';
import { receiveVisitorQuestion } from '@server/services/builds/build-questions';
import { BuildQuestion } from '@server/models/build-question';

async function ownerWithBuild() {
  const { user, email, password } = await createUser();
  const build = await createFullBuild(user.id, { story: '' });
  const api = await apiClient();
  await api.signIn(email, password).then((r) => expect(r.status).toBe(200));
  return { build, api };
}

const binary = (r: request.Test) =>
  r.buffer(true).parse((res, cb) => {
    const chunks: Buffer[] = [];
    res.on('data', (c: Buffer) => chunks.push(c));
    res.on('end', () => cb(null, Buffer.concat(chunks)));
  });

const CARD = { design: 'poster', paper: 'letter', orientation: 'portrait', sections: ['engine'], figures: ['power'], units: 'imperial' };

describe('the card carries one answered question or log post when the owner chooses', () => {
  it('offers the answered questions and published posts, saves the choice and prints it', async () => {
    const { build, api } = await ownerWithBuild();
    const questions = (await api.post(`/api/builds/${build.id}/questions`, { question: 'Is it drivable?', answer: 'Every *weekend*, rain or not.', askedCount: 7 })).body.questions;
    const post = (await api.post(`/api/builds/${build.id}/log`, { postedOn: '2025-09-13', title: 'First fire-up', body: 'It ran at the first turn.', status: 'published' })).body.post;
    await api.post(`/api/builds/${build.id}/log`, { postedOn: '2025-10-01', title: 'Hidden draft', body: 'Not yet.', status: 'draft' });
    const offered = (await api.get(`/api/builds/${build.id}/card-settings`).expect(200)).body.highlights;
    expect(offered).toEqual([
      { kind: 'question', id: questions.answered[0].id, label: 'Question: Is it drivable?' },
      { kind: 'log', id: post.id, label: 'Log post: 2025-09-13 · First fire-up' },
    ]);

    const saved = await api.put(`/api/builds/${build.id}/card-settings`, { ...CARD, highlight: { kind: 'question', id: questions.answered[0].id } });
    expect(saved.status).toBe(200);
    const text = await pdfText((await binary(api.raw.get(`/api/builds/${build.id}/card.pdf`)).expect(200)).body as Buffer);
    expect(text).toContain('ASKED OFTEN');
    expect(text).toContain('Is it drivable?');
    expect(text).toContain('Every weekend, rain or not.');

    // The designer's preview asks for another one, or none, without saving.
    const asLog = await pdfText((await binary(api.raw.get(`/api/builds/${build.id}/card.pdf?highlight=log:${post.id}`)).expect(200)).body as Buffer);
    expect(asLog).toContain('FROM THE BUILD LOG');
    expect(asLog).toContain('First fire-up');
    const none = await pdfText((await binary(api.raw.get(`/api/builds/${build.id}/card.pdf?highlight=none`)).expect(200)).body as Buffer);
    expect(none).not.toContain('ASKED OFTEN');
    expect((await api.raw.get(`/api/builds/${build.id}/card.pdf?highlight=story:1`)).status).toBe(400);
  });

  it('refuses a waiting question, a draft post or another build’s answer, and drops one taken off the page', async () => {
    const { build, api } = await ownerWithBuild();
    const { build: other, api: otherApi } = await ownerWithBuild();
    const foreign = (await otherApi.post(`/api/builds/${other.id}/questions`, { question: 'Theirs?', answer: 'Yes.' })).body.questions.answered[0].id;
    await receiveVisitorQuestion(build.id, 'Still waiting?');
    const waiting = await BuildQuestion.findOne({ where: { buildId: build.id } });
    const draft = (await api.post(`/api/builds/${build.id}/log`, { postedOn: '2025-10-01', title: 'Hidden draft', body: 'Not yet.' })).body.post;
    for (const highlight of [{ kind: 'question', id: foreign }, { kind: 'question', id: waiting!.id }, { kind: 'log', id: draft.id }]) {
      const res = await api.put(`/api/builds/${build.id}/card-settings`, { ...CARD, highlight });
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.error.fields)).toEqual(['highlight']);
    }
    const mine = (await api.post(`/api/builds/${build.id}/questions`, { question: 'Why so low?', answer: 'Air springs.' })).body.questions.answered[0].id;
    expect((await api.put(`/api/builds/${build.id}/card-settings`, { ...CARD, highlight: { kind: 'question', id: mine } })).status).toBe(200);
    await api.delete(`/api/builds/${build.id}/questions/${mine}`);
    const text = await pdfText((await binary(api.raw.get(`/api/builds/${build.id}/card.pdf`)).expect(200)).body as Buffer);
    expect(text).not.toContain('Why so low?');
    expect(text).not.toContain('ASKED OFTEN');
  });
});
