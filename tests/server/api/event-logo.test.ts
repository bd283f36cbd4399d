import { describe, expect, it } from 'vitest';
import request from 'supertest';
import sharp from 'sharp';
import { Event } from '@server/models/event';
import { AuditLine } from '@server/models/audit-line';
import { testApp } from '../../support/api-client';
import { showWithClasses, signedIn, type ApiClient } from '../../support/event-factory';
import { memberOf } from '../../support/show-day-factory';
import { htmlFile, jpegWithGps, smallPng } from '../../support/images';

const sendLogo = (client: ApiClient, eventId: number, bytes: Buffer, name = 'logo.png') =>
  client.raw.post(`/api/events/${eventId}/logo`).set('X-CSRF-Token', client.csrf).attach('logo', bytes, name);

describe('a show’s logo', () => {
  it('goes through the photo pipeline and appears on the show’s screens, its public page and JSON, without metadata', async () => {
    const { organiser, eventId, slug } = await showWithClasses();
    const res = await sendLogo(organiser.client, eventId, await jpegWithGps(), 'field-meet.jpg');
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const logo = res.body.event.logo as { webp: string; jpeg: string; width: number };
    expect(logo.jpeg).toMatch(/^\/media\/photos\/[0-9a-f]{32}-\d+\.jpg$/);
    // Pages get one small size (the stored widths start at the pipeline's narrowest).
    expect(logo.width).toBeLessThanOrEqual(640);

    const file = await request(testApp()).get(logo.jpeg).buffer(true);
    expect(file.status).toBe(200);
    expect((await sharp(file.body as Buffer).metadata()).exif).toBeUndefined(); // the GPS position is gone

    const json = await request(testApp()).get(`/api/public/events/${slug}`);
    expect(json.body.event.logo).toEqual(logo);
    const page = await request(testApp()).get(`/e/${slug}`);
    expect(page.text).toContain(`src="${logo.jpeg}"`);
    expect(await AuditLine.count({ where: { eventId, action: 'logo_changed' } })).toBe(1);
  });

  it('replaces and removes it; the old files are gone', async () => {
    const { organiser, eventId } = await showWithClasses();
    const first = (await sendLogo(organiser.client, eventId, await smallPng())).body.event.logo;
    const second = (await sendLogo(organiser.client, eventId, await jpegWithGps())).body.event.logo;
    expect(second.jpeg).not.toBe(first.jpeg);
    expect((await request(testApp()).get(first.jpeg)).status).toBe(404);
    const removed = await organiser.client.delete(`/api/events/${eventId}/logo`);
    expect(removed.status).toBe(200);
    expect(removed.body.event.logo).toBeNull();
    expect((await request(testApp()).get(second.jpeg)).status).toBe(404);
  });

  it('refuses a file that is not an image, a missing file and JSON, naming the logo field; nothing changes', async () => {
    const { organiser, eventId } = await showWithClasses();
    const html = await sendLogo(organiser.client, eventId, htmlFile(), 'logo.png');
    expect(html.status).toBe(400);
    expect(html.body.error.fields.logo).toMatch(/is not a JPEG, PNG, WebP or AVIF image/);
    const none = await organiser.client.raw.post(`/api/events/${eventId}/logo`).set('X-CSRF-Token', organiser.client.csrf).field('note', 'x');
    expect(none.status).toBe(400);
    expect(none.body.error.fields.logo).toBeDefined();
    const json = await organiser.client.post(`/api/events/${eventId}/logo`, { logo: 'x' });
    expect(json.status).toBe(400);
    expect(json.body.error.fields.logo).toBe('Choose an image for the logo.');
    expect((await Event.findByPk(eventId))!.logo).toBeNull();
  });

  it('is for the show’s organisers only', async () => {
    const { eventId } = await showWithClasses();
    const judge = await memberOf(eventId, 'judge', 'Jo Judgewell');
    const stranger = await signedIn({ mayOrganise: true });
    for (const [client, status] of [[judge.client, 403], [stranger.client, 404]] as const) {
      expect((await sendLogo(client, eventId, await smallPng())).status).toBe(status);
      expect((await client.delete(`/api/events/${eventId}/logo`)).status).toBe(status);
    }
    const anonymous = await request(testApp()).post(`/api/events/${eventId}/logo`).attach('logo', await smallPng(), 'logo.png');
    expect([401, 403]).toContain(anonymous.status);
    expect((await Event.findByPk(eventId))!.logo).toBeNull();
  });
});
