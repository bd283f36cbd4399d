import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Op } from 'sequelize';
import { AuditLine } from '@server/models/audit-line';
import { Build } from '@server/models/build';
import { Entry } from '@server/models/entry';
import { Vote } from '@server/models/vote';
import { publicPageCache } from '@server/pages/page-cache';
import { checkPageVersionOnEveryRequest } from '../../support/page-cache';
import { peoplesChoiceWinners } from '@server/services/results/peoples-choice';
import { sequelize } from '@server/db/sequelize';
import { votingLimitsExplained, type VotingLimits } from '@shared/schemas/peoples-choice';
import { apiClient } from '../../support/api-client';
import { listenApp, rawGet } from '../../support/raw-http';
import { signedIn, showWithClasses } from '../../support/event-factory';
import { judgeOf, showInJudging, type ShowInJudging } from '../../support/judging-factory';
import { formTokenIn, loopbackAddress, visitor } from '../../support/visitor';

let server: Awaited<ReturnType<typeof listenApp>>;
// See a change of the window at once instead of within the cache's one-second trust.
checkPageVersionOnEveryRequest();
beforeAll(async () => {
  server = await listenApp();
});
afterAll(async () => {
  await server.close();
});

/** The public codes of the show's cars, in entry order. */
async function codesOf(show: ShowInJudging): Promise<string[]> {
  const entries = await Entry.findAll({ where: { id: show.entries.map((e) => e.id) }, include: [{ model: Build, as: 'build', attributes: ['code'] }], order: [['number', 'ASC']] });
  return entries.map((e) => e.build!.code);
}

async function votingShow() {
  const show = await showInJudging();
  const codes = await codesOf(show);
  const base = `/api/events/${show.eventId}/peoples-choice`;
  const open = await show.organiser.client.post(`${base}/open`);
  expect(open.status, JSON.stringify(open.body)).toBe(200);
  expect(open.body.peoplesChoice.open).toBe(true);
  const tally = async () => (await show.organiser.client.get(base)).body.peoplesChoice;
  const votesOf = async (number: number) => (await tally()).tally.find((t: { number: number }) => t.number === number).votes as number;
  return { ...show, codes, base, tally, votesOf };
}

const storedVotes = (eventId: number) => Vote.findAll({ where: { eventId }, raw: true });

describe('a visitor votes on the public build page', () => {
  it('votes once while the window is open, sees thanks on a fresh page, and a second vote is refused', async () => {
    const show = await votingShow();
    const [car1, car2] = show.codes as [string, string];
    const phone = visitor(server.baseUrl);

    const page = await phone.view(car1);
    expect(page.status).toBe(200);
    expect(page.headers['cache-control']).toBe('private, no-store');
    expect(page.headers.etag).toBeUndefined();
    expect(page.text).toContain('Vote for this car');
    expect(page.text).toContain(`action="/c/${car1}/vote?show=${show.slug}"`);
    expect(phone.cookies.get('placard.voter')).toBeDefined();

    const voted = await phone.vote(car1, formTokenIn(page.text));
    expect(voted.status).toBe(303);
    // A form without the show (an older page) votes in the car's one show taking votes.
    expect(voted.headers.location).toBe(`/c/${car1}?show=${show.slug}#vote-${show.slug}`);
    const after = await phone.view(car1);
    expect(after.headers['cache-control']).toBe('private, no-store');
    expect(after.text).toContain('Thank you for voting');
    expect(after.text).toContain('went to this car');
    expect(formTokenIn(after.text)).toBeUndefined();
    expect(await show.votesOf(1)).toBe(1);

    // Another car's page names the car this visitor chose; a form kept from before is refused.
    const other = await phone.view(car2);
    expect(other.text).toContain('went to entry 1');
    const again = await phone.vote(car2, formTokenIn(page.text));
    expect(again.status).toBe(409);
    expect(again.text).toContain('You have already voted');
    expect(again.text).toContain('for entry 1');
    expect(await show.votesOf(1)).toBe(1);
    expect(await show.votesOf(2)).toBe(0);
    expect(await storedVotes(show.eventId)).toHaveLength(1);
  });

  it('keeps every visitor’s token and thanks out of the shared cached page', async () => {
    const show = await votingShow();
    const car = show.codes[0]!;
    const a = visitor(server.baseUrl);
    const b = visitor(server.baseUrl);
    const pageA = await a.view(car);
    await a.vote(car, formTokenIn(pageA.text));
    const pageB = await b.view(car);
    expect(formTokenIn(pageB.text)).toBeDefined();
    expect(formTokenIn(pageB.text)).not.toBe(formTokenIn(pageA.text));
    expect(pageB.text).not.toContain('Thank you for voting');
    expect((await a.view(car)).text).toContain('Thank you for voting');
    const cached = ['metric', 'uk', 'imperial'].map((units) => publicPageCache.get(`${car}|${units}`)).find(Boolean);
    expect(cached).toBeDefined();
    const shared = cached!.identity.toString('utf8');
    expect(shared).toContain('data-vote-box');
    expect(shared).not.toContain('name="token"');
    expect(shared).not.toContain('Thank you');
  });
});

describe('the voting window', () => {
  it('refuses a vote before the window opens and after it closes, and the page follows the window at once', async () => {
    const show = await showInJudging();
    const [car] = (await codesOf(show)) as [string];
    const base = `/api/events/${show.eventId}/peoples-choice`;
    const phone = visitor(server.baseUrl);

    const before = await phone.view(car);
    expect(before.text).not.toContain('Vote for this car');
    expect(before.headers['cache-control']).toBe('public, no-cache'); // on a show whose voting may open any moment
    expect((await phone.vote(car, 'anything')).status).toBe(403); // no cookie yet, so no valid form

    const showPage = async () => (await rawGet(`${server.baseUrl}/e/${show.slug}`)).body.toString('utf8');
    expect(await showPage()).not.toContain('People’s choice voting is open');
    expect((await show.organiser.client.post(`${base}/open`)).status).toBe(200);
    expect(await showPage()).toContain('People’s choice voting is open');
    const open = await phone.view(car);
    const token = formTokenIn(open.text);
    expect(token).toBeDefined();
    expect((await show.organiser.client.post(`${base}/close`)).status).toBe(200);
    expect(await showPage()).not.toContain('People’s choice voting is open');
    const closedPage = await phone.view(car);
    expect(closedPage.text).not.toContain('Vote for this car');
    const late = await phone.vote(car, token);
    expect(late.status).toBe(409);
    expect(late.text).toContain('Voting is not open');
    expect(await storedVotes(show.eventId)).toHaveLength(0);

    const trail = await AuditLine.findAll({ where: { eventId: show.eventId, action: { [Op.like]: 'peoples_choice_%' } }, order: [['id', 'ASC']] });
    expect(trail.map((l) => [l.action, l.actorId])).toEqual([
      ['peoples_choice_opened', show.organiser.user.id],
      ['peoples_choice_closed', show.organiser.user.id],
    ]);
  });

  it('opens only on show day or in judging', async () => {
    const show = await showWithClasses();
    const res = await show.organiser.client.post(`/api/events/${show.eventId}/peoples-choice/open`);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/show day or while the show is being judged/);
    expect((await show.organiser.client.get(`/api/events/${show.eventId}/peoples-choice`)).body.peoplesChoice).toMatchObject({ open: false, mayOpen: false });
  });
});

describe('cross-site and forged votes', () => {
  it('refuses a vote without the form token, with a forged one, with another visitor’s, from another origin, or with a forged cookie', async () => {
    const show = await votingShow();
    const car = show.codes[0]!;
    const phone = visitor(server.baseUrl);
    const token = formTokenIn((await phone.view(car)).text)!;
    const stranger = visitor(server.baseUrl);
    const strangerToken = formTokenIn((await stranger.view(car)).text)!;
    const cookie = phone.cookies.get('placard.voter')!;

    const refusals = [
      await phone.vote(car, undefined),
      await phone.vote(car, ''),
      await phone.vote(car, 'x'.repeat(token.length)),
      await phone.vote(car, strangerToken),
      await phone.vote(car, token, { origin: 'https://elsewhere.example' }),
      await phone.vote(car, token, { origin: 'null' }),
      await phone.vote(car, token, { 'sec-fetch-site': 'cross-site' }),
      await phone.vote(car, token, { cookie: `placard.voter=${cookie.replace(/\.[^.]+$/, '.forgedsignature')}` }),
      await phone.vote(car, token, { cookie: '' }),
    ];
    for (const r of refusals) {
      expect(r.status).toBe(403);
      expect(r.text).toContain('This vote could not be checked');
    }
    expect(await storedVotes(show.eventId)).toHaveLength(0);

    // The same form, as the page gave it, is counted.
    expect((await phone.vote(car, token)).status).toBe(303);
    expect(await show.votesOf(1)).toBe(1);
  });
});

describe('the rate limit per address', () => {
  it('refuses votes from an address past the limit, refused attempts included, while another address still votes', async () => {
    const show = await votingShow();
    const car = show.codes[0]!;
    const address = loopbackAddress();
    const spammer = visitor(server.baseUrl, address);
    const token = formTokenIn((await spammer.view(car)).text)!;
    // The default limit is 30 attempts per 10 minutes (VOTE_RATE_LIMIT).
    for (let i = 0; i < 30; i++) expect((await spammer.vote(car, undefined)).status).toBe(403);
    const limited = await spammer.vote(car, token);
    expect(limited.status).toBe(429);
    expect(limited.text).toContain('Too many votes from this network');
    const sameNetwork = visitor(server.baseUrl, address);
    expect((await sameNetwork.viewAndVote(car)).status).toBe(429);
    expect(await storedVotes(show.eventId)).toHaveLength(0);

    expect((await visitor(server.baseUrl).viewAndVote(car)).status).toBe(303);
    expect(await show.votesOf(1)).toBe(1);
  });
});

describe('bursts of new voters from one address', () => {
  it('slows a burst, shows it to the organiser, and voids the burst alone: an earlier voter on that address still counts', async () => {
    const show = await votingShow();
    const [car1, car2] = show.codes as [string, string];
    const limits = (await show.tally()).limits as VotingLimits;
    expect(limits).toEqual({ attempts: 30, attemptsWindowMinutes: 10, newVoters: 10, newVotersWindowMinutes: 10, burstFrom: 5, burstWindowMinutes: 10 });
    const network = loopbackAddress();

    // An honest visitor on this network voted half an hour before the burst (the stored time moved back, as if so).
    expect((await visitor(server.baseUrl, network).viewAndVote(car2)).status).toBe(303);
    const [honest] = await storedVotes(show.eventId);
    await sequelize.query(`UPDATE votes SET created_at = now() - interval '30 minutes' WHERE id = :id`, { replacements: { id: honest!.id } });

    // One machine clearing its cookies: each time a new visitor. The honest vote used one of the window's counted votes.
    for (let i = 1; i < limits.newVoters; i++) expect((await visitor(server.baseUrl, network).viewAndVote(car1)).status).toBe(303);
    const slowed = await visitor(server.baseUrl, network).viewAndVote(car1);
    expect(slowed.status).toBe(429);
    expect(slowed.text).toContain('Too many votes from this network');
    expect((await visitor(server.baseUrl).viewAndVote(car1)).status).toBe(303); // another address is not held back
    expect(await storedVotes(show.eventId)).toHaveLength(limits.newVoters + 1);

    const seen = await show.tally();
    expect(seen.bursts).toHaveLength(1);
    const burst = seen.bursts[0];
    expect(burst).toMatchObject({ addressHash: honest!.addressHash, votes: limits.newVoters - 1, voided: 0 });
    expect(Date.parse(burst.to) - Date.parse(burst.from)).toBeLessThan(limits.burstWindowMinutes * 60_000);
    expect(seen.addresses.find((a: { addressHash: string }) => a.addressHash === honest!.addressHash)).toMatchObject({ votes: limits.newVoters, voided: 0 });

    const wrong = await show.organiser.client.post(`${show.base}/void-burst`, { addressHash: 'nope', from: burst.to, to: burst.from });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields).toMatchObject({ addressHash: expect.any(String) });
    const backwards = await show.organiser.client.post(`${show.base}/void-burst`, { addressHash: burst.addressHash, from: burst.to, to: '2020-01-01T00:00:00.000Z' });
    expect(backwards.body.error.fields.to).toMatch(/after its start/);

    const voided = await show.organiser.client.post(`${show.base}/void-burst`, { addressHash: burst.addressHash, from: burst.from, to: burst.to });
    expect(voided.status).toBe(200);
    expect(voided.body.voided).toBe(limits.newVoters - 1);
    const after = voided.body.peoplesChoice;
    expect(after.tally.map((t: { number: number; votes: number }) => [t.number, t.votes]).slice(0, 2)).toEqual([[1, 1], [2, 1]]);
    expect(after).toMatchObject({ totalVotes: 2, voidedVotes: limits.newVoters - 1 });
    expect(after.bursts[0]).toMatchObject({ votes: limits.newVoters - 1, voided: limits.newVoters - 1 });
    expect((await Vote.findByPk(honest!.id))?.voidedAt).toBeNull();
    const line = await AuditLine.findOne({ where: { eventId: show.eventId, action: 'peoples_choice_burst_voided' } });
    expect(line?.actorId).toBe(show.organiser.user.id);
    expect(line?.after).toMatchObject({ addressHash: burst.addressHash, votes: limits.newVoters - 1 });

    const judge = await judgeOf(show.eventId);
    expect((await judge.client.post(`${show.base}/void-burst`, { addressHash: burst.addressHash, from: burst.from, to: burst.to })).status).toBe(403);
  });

  it('says on the panel what the limits stop and what they cannot, with the numbers in force', async () => {
    const show = await votingShow();
    const words = votingLimitsExplained((await show.tally()).limits);
    expect(words.stops.join(' ')).toContain('at most 30 vote attempts every 10 minutes');
    expect(words.stops.join(' ')).toContain('at most 10 counted votes every 10 minutes, however often its cookies are cleared');
    expect(words.stops.join(' ')).toMatch(/From 5 new voters on one address within 10 minutes.*void on its own/);
    expect(words.cannotStop.join(' ')).toMatch(/changes network/);
    expect(words.cannotStop.join(' ')).toMatch(/can be honest/);
  });
});

describe('the organiser', () => {
  it('sees the tally per car and each address as a shortened keyed hash, and voids one address’s votes', async () => {
    const show = await votingShow();
    const [car1, car2, car3] = show.codes as [string, string, string];
    const crowded = loopbackAddress();
    for (let i = 0; i < 3; i++) expect((await visitor(server.baseUrl, crowded).viewAndVote(car1)).status).toBe(303);
    expect((await visitor(server.baseUrl).viewAndVote(car2)).status).toBe(303);
    expect((await visitor(server.baseUrl).viewAndVote(car2)).status).toBe(303);
    expect((await visitor(server.baseUrl).viewAndVote(car3)).status).toBe(303);

    const tally = await show.tally();
    expect(tally.tally.map((t: { number: number; votes: number; title: string; className: string }) => [t.number, t.votes, t.className])).toEqual([
      [1, 3, 'Hot rods'],
      [2, 2, 'Hot rods'],
      [3, 1, 'Customs'],
      [4, 0, 'Customs'],
    ]);
    expect(tally.tally[0].title).toBe('First car');
    expect(tally.totalVotes).toBe(6);
    expect(tally.leaders).toEqual([show.entries[0]!.id]);
    expect(tally.addresses).toHaveLength(4);
    const stuffed = tally.addresses[0];
    expect(stuffed).toMatchObject({ votes: 3, voided: 0 });
    expect(stuffed.addressHash).toMatch(/^[0-9a-f]{64}$/);

    const bad = await show.organiser.client.post(`${show.base}/void`, { addressHash: crowded });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.addressHash).toBeDefined();

    const voided = await show.organiser.client.post(`${show.base}/void`, { addressHash: stuffed.addressHash });
    expect(voided.status).toBe(200);
    expect(voided.body.voided).toBe(3);
    const after = voided.body.peoplesChoice;
    expect(after.tally.map((t: { number: number; votes: number }) => [t.number, t.votes])).toEqual([[2, 2], [3, 1], [1, 0], [4, 0]]);
    expect(after).toMatchObject({ totalVotes: 3, voidedVotes: 3, leaders: [show.entries[1]!.id] });
    const line = await AuditLine.findOne({ where: { eventId: show.eventId, action: 'peoples_choice_votes_voided' } });
    expect(line?.actorId).toBe(show.organiser.user.id);
    expect(line?.after).toEqual({ addressHash: stuffed.addressHash, votes: 3 });

    // Voiding again changes nothing and writes no second line.
    expect((await show.organiser.client.post(`${show.base}/void`, { addressHash: stuffed.addressHash })).body.voided).toBe(0);
    expect(await AuditLine.count({ where: { eventId: show.eventId, action: 'peoples_choice_votes_voided' } })).toBe(1);
  });

  it('gives the award to the most votes and shares it on a tie; no votes, no award', async () => {
    const show = await votingShow();
    const [car1, car2, car3] = show.codes as [string, string, string];
    expect(await peoplesChoiceWinners(show.eventId)).toEqual([]);
    for (const code of [car1, car3, car1, car3, car2]) expect((await visitor(server.baseUrl).viewAndVote(code)).status).toBe(303);
    expect(await peoplesChoiceWinners(show.eventId)).toEqual([show.entries[0]!.id, show.entries[2]!.id]);
    expect((await show.tally()).leaders).toEqual([show.entries[0]!.id, show.entries[2]!.id]);
    expect((await visitor(server.baseUrl).viewAndVote(car3)).status).toBe(303);
    expect(await peoplesChoiceWinners(show.eventId)).toEqual([show.entries[2]!.id]);
  });

  it('is the only one who sees or runs the vote: judges, entrants, other organisers and anonymous are refused', async () => {
    const show = await votingShow();
    const judge = await judgeOf(show.eventId);
    const otherOrganiser = (await showWithClasses()).organiser;
    const stranger = await signedIn();
    const anonymous = await apiClient();
    const hash = 'a'.repeat(64);
    for (const [who, status] of [[judge.client, 403], [show.owner.client, 404], [otherOrganiser.client, 404], [stranger.client, 404], [anonymous, 401]] as const) {
      expect((await who.get(show.base)).status).toBe(status);
      expect((await who.post(`${show.base}/open`)).status).toBe(status);
      expect((await who.post(`${show.base}/close`)).status).toBe(status);
      expect((await who.post(`${show.base}/void`, { addressHash: hash })).status).toBe(status);
    }
    expect((await show.tally()).open).toBe(true);
  });
});

describe('what is stored', () => {
  it('keeps neither the visitor’s token nor their address: only keyed hashes, different per show', async () => {
    const show = await votingShow();
    const second = await votingShow();
    const address = loopbackAddress();
    const phone = visitor(server.baseUrl, address);
    expect((await phone.viewAndVote(show.codes[0]!)).status).toBe(303);
    expect((await phone.viewAndVote(second.codes[0]!)).status).toBe(303);
    const signed = decodeURIComponent(phone.cookies.get('placard.voter')!);
    const token = signed.replace(/^s:/, '').replace(/\.[^.]+$/, '');
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);

    const rows = [...(await storedVotes(show.eventId)), ...(await storedVotes(second.eventId))];
    expect(rows).toHaveLength(2);
    for (const row of rows) {
      const text = JSON.stringify(row);
      expect(text).not.toContain(token);
      expect(text).not.toContain(address);
      expect(row.voterHash).toMatch(/^[0-9a-f]{64}$/);
      expect(row.addressHash).toMatch(/^[0-9a-f]{64}$/);
    }
    // Keyed per show: the same visitor and address cannot be followed from one show to the next.
    expect(rows[0]!.voterHash).not.toBe(rows[1]!.voterHash);
    expect(rows[0]!.addressHash).not.toBe(rows[1]!.addressHash);
    // The organiser's view shows hashes only.
    expect(JSON.stringify(await show.tally())).not.toContain(address);
  });
});
