import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { createBuild } from '../../support/build-factory';
import { jpegWithGps } from '../../support/images';
import { storePhotosForBuild } from '@server/services/media/photos';
import { checkPageVersionOnEveryRequest } from '../../support/page-cache';
import { Build } from '@server/models/build';


checkPageVersionOnEveryRequest();
describe('a measured figure with an evidence photo, on the public page', () => {
  it('links the weight to its scale-ticket photo', async () => {
    const { user } = await createUser({ name: 'Ines Varro' });
    const build = await createBuild(user.id, { title: 'Weighed coupe', published: true });
    const [photo] = await storePhotosForBuild(build.id, [{ buffer: await jpegWithGps(), originalName: 'ticket.jpg' }], ['Scale ticket']);
    await Build.update({ weight: { value: 1287, unit: 'kg', provenance: 'measured', measuredOn: '2026-06-01', evidencePhotoId: photo!.id } }, { where: { id: build.id } });

    const res = await request(testApp()).get(`/c/${build.code}?units=metric`);
    expect(res.status).toBe(200);
    const weight = /<dt>Weight<\/dt><dd>([\s\S]*?)<\/dd>/.exec(res.text)?.[1] ?? '';
    expect(weight).toContain('measured 2026-06-01');
    // The largest stored width of that very photo (the test JPEG is 2000 px wide, so 1600).
    expect(weight).toContain(`<a href="/media/photos/${photo!.storageKey}-1600.jpg">see the evidence</a>`);
  });
});
