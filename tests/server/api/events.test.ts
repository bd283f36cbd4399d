import { describe, expect, it } from 'vitest';
import { apiClient } from '../../support/api-client';
import { showSettings, showWithClasses, signedIn } from '../../support/event-factory';
import { AuditLine } from '@server/models/audit-line';

describe('shows: create and settings', () => {
  it('lets a may-organise account create a show and become its organiser; others get 403, anonymous 401', async () => {
    const organiser = await signedIn({ mayOrganise: true });
    const res = await organiser.client.post('/api/events', showSettings({ name: 'Spring Gathering', entryFee: 1850, currency: 'usd' }));
    expect(res.status).toBe(201);
    const { event } = res.body;
    expect(event.status).toBe('draft');
    expect(event.myRoles).toEqual(['organiser']);
    expect(event.currency).toBe('USD');
    expect(event.entryFee).toBe(1850);
    expect(event.abilities).toMatchObject({ manage: true, viewEntries: true, checkIn: false, judge: false });
    expect(event.publicUrl).toBe(`http://127.0.0.1:3999/e/${event.slug}`);
    const mine = await organiser.client.get('/api/events');
    expect(mine.body.events.map((e: { id: number }) => e.id)).toContain(event.id);

    const owner = await signedIn();
    expect((await owner.client.post('/api/events', showSettings())).status).toBe(403);
    const anonymous = await apiClient();
    expect((await anonymous.post('/api/events', showSettings())).status).toBe(401);
  });

  it('refuses a time zone that does not exist, an end before the start and a window closing after the show, naming each field', async () => {
    const { client } = await signedIn({ mayOrganise: true });
    const start = new Date(Date.now() + 30 * 86400_000);
    const bad = await client.post(
      '/api/events',
      showSettings({
        timeZone: 'Mars/Olympus_Mons',
        endsAt: new Date(start.getTime() - 3600_000).toISOString(),
        startsAt: start.toISOString(),
        registrationClosesAt: new Date(start.getTime() + 3600_000).toISOString(),
        currency: 'ZZZ',
        entryFee: 12.5,
      }),
    );
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['currency', 'endsAt', 'entryFee', 'registrationClosesAt', 'timeZone']);
    expect(bad.body.error.fields.timeZone).toMatch(/IANA/);

    const opensLate = await client.post('/api/events', showSettings({ registrationOpensAt: new Date(start.getTime() - 3600_000).toISOString(), registrationClosesAt: new Date(start.getTime() - 7200_000).toISOString() }));
    expect(opensLate.status).toBe(400);
    expect(Object.keys(opensLate.body.error.fields)).toEqual(['registrationOpensAt']);
  });

  it('checks the date rules on a change against the stored values too, and keeps the slug unique', async () => {
    const { organiser, eventId, slug } = await showWithClasses({ open: false });
    const detail = (await organiser.client.get(`/api/events/${eventId}`)).body.event;
    const endBeforeStart = await organiser.client.patch(`/api/events/${eventId}`, { endsAt: new Date(new Date(detail.startsAt).getTime() - 60_000).toISOString() });
    expect(endBeforeStart.status).toBe(400);
    expect(Object.keys(endBeforeStart.body.error.fields)).toEqual(['endsAt']);
    expect((await organiser.client.patch(`/api/events/${eventId}`, { timeZone: 'Nowhere/Land' })).body.error.fields.timeZone).toBeDefined();

    const ok = await organiser.client.patch(`/api/events/${eventId}`, { name: 'Renamed Meet', capacity: 80, timeZone: 'America/Chicago' });
    expect(ok.status).toBe(200);
    expect(ok.body.event).toMatchObject({ name: 'Renamed Meet', capacity: 80, timeZone: 'America/Chicago' });

    const other = await showWithClasses({ open: false });
    const clash = await other.organiser.client.patch(`/api/events/${other.eventId}`, { slug });
    expect(clash.status).toBe(409);
    expect(clash.body.error.fields.slug).toBeDefined();
  });
});

describe('shows: the lifecycle', () => {
  it('walks draft → entries open → closed → show day → judging → results → archived, each step once and in order, with an audit line', async () => {
    const { organiser, eventId } = await showWithClasses({ open: false });
    const step = (action: string) => organiser.client.post(`/api/events/${eventId}/lifecycle`, { action });

    expect((await step('open_gate')).status).toBe(409);
    expect((await step('open_registration')).body.event.status).toBe('registration_open');
    expect((await step('open_registration')).status).toBe(409);
    expect((await step('close_registration')).body.event.status).toBe('registration_closed');
    expect((await step('reopen_registration')).body.event.status).toBe('registration_open');
    expect((await step('close_registration')).body.event.status).toBe('registration_closed');
    expect((await step('open_gate')).body.event.status).toBe('show_day');
    const noSheet = await step('start_judging');
    expect(noSheet.status).toBe(409);
    expect(noSheet.body.error.message).toMatch(/judging sheet/);
    expect((await organiser.client.put(`/api/events/${eventId}/criteria`, { criteria: [{ name: 'Paint', maxPoints: 10, weight: 1 }] })).status).toBe(200);
    expect((await step('start_judging')).body.event.status).toBe('judging');
    expect((await step('publish_results')).body.event.status).toBe('results_published');
    expect((await step('archive')).body.event.status).toBe('archived');
    expect((await step('nonsense')).body.error.fields.action).toBeDefined();
    expect((await organiser.client.patch(`/api/events/${eventId}`, { name: 'Too late' })).status).toBe(409);

    const lines = await AuditLine.findAll({ where: { eventId }, order: [['id', 'ASC']] });
    const steps = lines.filter((l) => l.before && (l.before as { status?: string }).status).map((l) => `${(l.before as { status: string }).status}→${(l.after as { status: string }).status}`);
    expect(steps).toEqual([
      'draft→registration_open',
      'registration_open→registration_closed',
      'registration_closed→registration_open',
      'registration_open→registration_closed',
      'registration_closed→show_day',
      'show_day→judging',
      'judging→results_published',
      'results_published→archived',
    ]);
    expect(lines.every((l) => l.actorId === organiser.user.id)).toBe(true);
    const audit = await organiser.client.get(`/api/events/${eventId}/audit`);
    expect(audit.body.audit[0]).toMatchObject({ action: 'archive', who: 'Org Anizer' });
  });

  it('will not open entries for a show with no classes', async () => {
    const { organiser, eventId } = await showWithClasses({ open: false, classes: [] });
    const res = await organiser.client.post(`/api/events/${eventId}/lifecycle`, { action: 'open_registration' });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/class/);
  });
});

describe('classes and the judging sheet', () => {
  it('adds, changes and removes classes in order, with capacity', async () => {
    const { organiser, eventId, classIds } = await showWithClasses({ open: false, classes: [{ name: 'Hot rods' }, { name: 'Customs', capacity: 12 }] });
    const detail = (await organiser.client.get(`/api/events/${eventId}`)).body.event;
    expect(detail.classes.map((c: { name: string; capacity: number | null }) => [c.name, c.capacity])).toEqual([['Hot rods', null], ['Customs', 12]]);
    expect((await organiser.client.post(`/api/events/${eventId}/classes`, { name: '  ' })).body.error.fields.name).toBeDefined();
    expect((await organiser.client.post(`/api/events/${eventId}/classes`, { name: 'X', capacity: 0 })).body.error.fields.capacity).toBeDefined();
    const moved = await organiser.client.patch(`/api/events/${eventId}/classes/${classIds[1]}`, { position: 0, name: 'Customs & lead sleds' });
    expect(moved.body.class).toMatchObject({ name: 'Customs & lead sleds', position: 0 });
    expect((await organiser.client.delete(`/api/events/${eventId}/classes/${classIds[0]}`)).status).toBe(204);
    expect((await organiser.client.get(`/api/events/${eventId}`)).body.event.classes).toHaveLength(1);
  });

  it('saves the judging sheet whole, refuses twin tie-break places and bad points, and fixes it once judging starts', async () => {
    const { organiser, eventId } = await showWithClasses({ open: false });
    const sheet = [
      { name: 'Paint and body', maxPoints: 20, weight: 1.5, tieBreakOrder: 1 },
      { name: 'Engine bay', maxPoints: 20, weight: 1, tieBreakOrder: 2 },
      { name: 'Interior', maxPoints: 10, weight: 1, tieBreakOrder: null },
    ];
    const saved = await organiser.client.put(`/api/events/${eventId}/criteria`, { criteria: sheet });
    expect(saved.status).toBe(200);
    expect(saved.body.event.criteria.map((c: { name: string; weight: number; position: number }) => [c.name, c.weight, c.position])).toEqual([
      ['Paint and body', 1.5, 0],
      ['Engine bay', 1, 1],
      ['Interior', 1, 2],
    ]);
    const twins = await organiser.client.put(`/api/events/${eventId}/criteria`, { criteria: [{ ...sheet[0] }, { ...sheet[1], tieBreakOrder: 1 }] });
    expect(twins.status).toBe(400);
    expect(twins.body.error.fields['criteria.1.tieBreakOrder']).toMatch(/tie-break/);
    const badPoints = await organiser.client.put(`/api/events/${eventId}/criteria`, { criteria: [{ name: 'Paint', maxPoints: 0, weight: -1 }] });
    expect(Object.keys(badPoints.body.error.fields).sort()).toEqual(['criteria.0.maxPoints', 'criteria.0.weight']);

    for (const action of ['open_registration', 'close_registration', 'open_gate', 'start_judging']) {
      expect((await organiser.client.post(`/api/events/${eventId}/lifecycle`, { action })).status).toBe(200);
    }
    const fixed = await organiser.client.put(`/api/events/${eventId}/criteria`, { criteria: sheet.slice(0, 1) });
    expect(fixed.status).toBe(409);
    expect((await organiser.client.get(`/api/events/${eventId}`)).body.event.criteria).toHaveLength(3);
  });
});

describe('one show’s organiser has no say in another show', () => {
  it('finds no such show behind another show’s settings, classes, sheet, people, entries, audit and lifecycle (404, as for a missing one)', async () => {
    const a = await showWithClasses();
    const b = await showWithClasses();
    const c = a.organiser.client;
    const id = b.eventId;
    const missing = await c.get('/api/events/999999999');
    const foreign = await c.get(`/api/events/${id}`);
    expect([foreign.status, foreign.body]).toEqual([404, missing.body]);
    expect((await c.patch(`/api/events/${id}`, { name: 'Mine' })).status).toBe(404);
    expect((await c.post(`/api/events/${id}/classes`, { name: 'Mine' })).status).toBe(404);
    expect((await c.patch(`/api/events/${id}/classes/${b.classIds[0]}`, { name: 'Mine' })).status).toBe(404);
    expect((await c.put(`/api/events/${id}/criteria`, { criteria: [] })).status).toBe(404);
    expect((await c.get(`/api/events/${id}/people`)).status).toBe(404);
    expect((await c.post(`/api/events/${id}/invitations`, { email: 'x@example.test', role: 'judge' })).status).toBe(404);
    expect((await c.get(`/api/events/${id}/entries`)).status).toBe(404);
    expect((await c.get(`/api/events/${id}/audit`)).status).toBe(404);
    expect((await c.post(`/api/events/${id}/lifecycle`, { action: 'close_registration' })).status).toBe(404);
    expect((await c.get(`/api/events`)).body.events.map((e: { id: number }) => e.id)).not.toContain(id);
    // A class of another show cannot be reached through one's own show either.
    expect((await c.patch(`/api/events/${a.eventId}/classes/${b.classIds[0]}`, { name: 'Mine' })).status).toBe(404);
    expect((await c.get('/api/events/999999999')).status).toBe(404);
    expect((await c.get('/api/events/abc')).body.error.fields.id).toBeDefined();
  });
});
