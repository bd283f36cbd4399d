import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { brotliDecompressSync } from 'node:zlib';
import { createUser } from '../../support/factories';
import { createFullBuild } from '../../support/build-factory';
import { listenApp, rawGet } from '../../support/raw-http';
import { jpegWithGps } from '../../support/images';
import { storePhotosForBuild } from '@server/services/media/photos';
import { createLogPost } from '@server/services/builds/build-log';
import { createAnsweredQuestion, receiveVisitorQuestion } from '@server/services/builds/build-questions';
import { DEMO_ANSWERS, DEMO_LOG_POSTS, DEMO_WAITING_QUESTION } from '@server/db/demo/build-log';

let http: Awaited<ReturnType<typeof listenApp>>;
beforeAll(async () => {
  http = await listenApp();
});
afterAll(() => http.close());

describe('the public page with the demo’s build log and answers', () => {
  it('stays under 30 KB compressed before images, with the newest posts and every answer on it', async () => {
    const { user } = await createUser({ name: 'Avery Quill' });
    const build = await createFullBuild(user.id);
    const photos = await storePhotosForBuild(build.id, [{ buffer: await jpegWithGps(), originalName: 'a.jpg' }, { buffer: await jpegWithGps(), originalName: 'b.jpg' }], ['Side view', 'In the shop']);
    for (const p of DEMO_LOG_POSTS) {
      await createLogPost(build, {
        postedOn: p.postedOn,
        title: p.title,
        body: p.body,
        status: p.draft ? 'draft' : 'published',
        photoIds: (p.photos ?? []).map((n) => photos[n - 1]!.id),
        dynoRunId: null,
        weighInId: null,
      });
    }
    for (const a of DEMO_ANSWERS) await createAnsweredQuestion(build, a);
    await receiveVisitorQuestion(build.id, DEMO_WAITING_QUESTION);

    const br = await rawGet(`${http.baseUrl}/c/${build.code}`, { 'Accept-Encoding': 'br' });
    const gz = await rawGet(`${http.baseUrl}/c/${build.code}`, { 'Accept-Encoding': 'gzip' });
    expect(br.body.length).toBeLessThan(30 * 1024);
    expect(gz.body.length).toBeLessThan(30 * 1024);
    const html = brotliDecompressSync(br.body).toString('utf8');
    for (const a of DEMO_ANSWERS) expect(html).toContain(a.question.replace(/'/g, '&#x27;'));
    expect(html).not.toContain(DEMO_WAITING_QUESTION);
    expect(html).toContain('All 12 posts');
    expect(html).not.toContain('Winter list');
    expect(html).not.toMatch(/<script/i);
  });
});
