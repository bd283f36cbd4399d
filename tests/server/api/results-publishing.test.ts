import { describe, expect, it } from 'vitest';
import { apiClient } from '../../support/api-client';
import { signedIn } from '../../support/event-factory';
import { scoreItem } from '../../support/judging-factory';
import { waitForMailAbout } from '../../support/mailbox';
import { mediaBoxes, pdfText } from '../../support/pdf';
import { judgedShow } from '../../support/results-factory';

// Sheet weights 2, 1.5, 1 (max 10, 10, 5). Both judges score alike unless said otherwise:
//   Deuce and Flathead: 8, 6, 4 → 16 + 9 + 4 = 29, equal on every tie-break line too: a shared 1st.
//   Ratrod: 6, 6, 4 → 25.  Merc: 10, 10, 5 → 40, best of show (leaves its class by default).  Lead sled: 5, 5, 3 → 20.5.
async function scoredShow(rules?: Record<string, unknown>) {
  const show = await judgedShow({ hotRods: ['Deuce', 'Flathead', 'Ratrod'], customs: ['Merc', 'Lead sled'] }, rules);
  for (const j of [0, 1]) {
    await show.score(j, 'Deuce', [8, 6, 4], j === 0 ? ['Deep, even black paint', '', ''] : []);
    await show.score(j, 'Flathead', [8, 6, 4]);
    await show.score(j, 'Ratrod', [6, 6, 4]);
    await show.score(j, 'Merc', [10, 10, 5]);
    await show.score(j, 'Lead sled', [5, 5, 3]);
  }
  return show;
}

const RULES = { trimFromSheets: null, placesPerClass: 3, bestOfShow: true, bestOfShowKeepsClassPlace: false, shareCommentsWithEntrants: true, printPaper: 'letter' };

describe('publishing results', () => {
  it('is for organisers only: judges, entrants and anonymous are refused, and nothing is published', async () => {
    const show = await scoredShow();
    const step = { action: 'publish_results' };
    const url = `/api/events/${show.eventId}/lifecycle`;
    expect((await show.judges[0]!.client.post(url, step)).status).toBe(403);
    expect((await show.car('Deuce').owner.client.post(url, step)).status).toBe(404);
    expect((await (await apiClient()).post(url, step)).status).toBe(401);
    expect((await (await apiClient()).get(`/api/public/events/${show.slug}`)).body.event.results).toBeNull();

    const published = await show.publish();
    expect(published.status).toBe(200);
    expect(published.body.event.status).toBe('results_published');
  });

  it('locks the scores, the rules and the hand order once published', async () => {
    const show = await scoredShow();
    expect((await show.publish()).status).toBe(200);
    const late = await show.judges[0]!.client.post(`/api/events/${show.eventId}/scores`, { scores: [scoreItem(show.car('Ratrod').id, show.criteria[0]!.id, 10)] });
    expect(late.status).toBe(409);
    expect(late.body.error.message).toMatch(/Results are published/);
    const rules = await show.organiser.client.put(`/api/events/${show.eventId}/results/rules`, { ...RULES, shareCommentsWithEntrants: false });
    expect(rules.status).toBe(409);
    const tie = await show.organiser.client.post(`/api/events/${show.eventId}/results/tie-breaks`, { entryIds: [show.car('Deuce').id, show.car('Flathead').id], reason: 'Cleaner underside' });
    expect(tie.status).toBe(409);
  });

  it('shows the results on the public page and its JSON twin: places, numbers, linked titles, rounded totals, and nothing private', async () => {
    const show = await scoredShow();
    expect((await show.publish()).status).toBe(200);
    const anon = await apiClient();
    const json = (await anon.get(`/api/public/events/${show.slug}`)).body.event;
    const [hotRods, customs] = json.results.classes;
    expect(json.results.bestOfShow.map((l: { number: number; title: string; total: string }) => [l.number, l.title, l.total])).toEqual([[show.car('Merc').number, 'Merc', '40.00']]);
    expect(hotRods.placings.map((l: { place: number; shared: boolean; title: string; total: string }) => [l.place, l.shared, l.title, l.total]).sort()).toEqual([
      [1, true, 'Deuce', '29.00'],
      [1, true, 'Flathead', '29.00'],
      [3, false, 'Ratrod', '25.00'],
    ]);
    expect(customs.placings.map((l: { place: number; title: string; total: string }) => [l.place, l.title, l.total])).toEqual([[1, 'Lead sled', '20.50']]);
    expect(hotRods.placings[0].url).toMatch(new RegExp(`/c/(${show.car('Deuce').code}|${show.car('Flathead').code})$`));
    // The allow-list: exactly these keys per line, no judge, no comment, no owner.
    expect(Object.keys(json.results.bestOfShow[0]).sort()).toEqual(['className', 'number', 'place', 'shared', 'title', 'total', 'url']);

    const page = await anon.get(`/e/${show.slug}`);
    expect(page.status).toBe(200);
    expect(page.text).toContain('Best of show');
    expect(page.text).toMatch(/1st \(shared\)/);
    expect(page.text).toContain(`href="${json.results.bestOfShow[0].url}"`);
    expect(page.text).toContain('20.50');
    for (const text of [page.text, JSON.stringify(json)]) {
      for (const secret of [show.car('Deuce').owner.email, 'Ada Marsh', 'Bo Lindqvist', 'Deep, even black paint', show.organiser.email]) expect(text).not.toContain(secret);
    }
  });

  it('mails each entrant their own place and scores per criterion, with the judges’ comments when the show shares them', async () => {
    const show = await scoredShow();
    expect((await show.publish()).status).toBe(200);
    const deuce = await waitForMailAbout(show.car('Deuce').owner.email, /Results:/);
    expect(deuce.text).toMatch(/Deuce, number \d+: 1st place in Hot rods \(shared\), with a total of 29\.00/);
    expect(deuce.text).toContain('Paint and body: 8.00 of 10 (counts ×2); sheets 8, 8');
    expect(deuce.text).toContain('Interior: 4.00 of 5; sheets 4, 4');
    expect(deuce.text).toContain('Paint and body: “Deep, even black paint”');
    expect(deuce.text).not.toMatch(/Ada Marsh|Bo Lindqvist/);
    const merc = await waitForMailAbout(show.car('Merc').owner.email, /Results:/);
    expect(merc.text).toMatch(/Merc, number \d+: Best of show, with a total of 40\.00/);
    expect(merc.text).not.toContain('Deep, even black paint'); // another car's comment never reaches this entrant
    const sled = await waitForMailAbout(show.car('Lead sled').owner.email, /Results:/);
    expect(sled.text).toContain('1st place in Customs');
  });

  it('leaves the judges’ comments out of the mail when the show keeps them private', async () => {
    const show = await scoredShow({ ...RULES, shareCommentsWithEntrants: false });
    expect((await show.publish()).status).toBe(200);
    const deuce = await waitForMailAbout(show.car('Deuce').owner.email, /Results:/);
    expect(deuce.text).toContain('Paint and body: 8.00 of 10');
    expect(deuce.text).not.toContain('Deep, even black paint');
    expect(deuce.text).not.toMatch(/What the judges wrote/);
  });
});

describe('an owner’s own scores', () => {
  it('are refused before publication, shown to the owner after, and never to another person', async () => {
    const show = await scoredShow();
    const deuce = show.car('Deuce');
    const url = `/api/entries/${deuce.id}/results`;
    const before = await deuce.owner.client.get(url);
    expect(before.status).toBe(409);
    expect(before.body.results).toBeUndefined();
    expect((await deuce.owner.client.get('/api/entries')).body.entries[0]).not.toHaveProperty('results');

    expect((await show.publish()).status).toBe(200);
    const after = await deuce.owner.client.get(url);
    expect(after.status).toBe(200);
    expect(after.body.results).toMatchObject({ place: 1, shared: true, total: '29.00', sheetsCounted: 2 });
    expect(after.body.results.criteria[0]).toEqual({ name: 'Paint and body', maxPoints: 10, weight: 2, mean: '8.00', judges: [8, 8] });
    expect(after.body.results.comments).toEqual([{ criterion: 'Paint and body', text: 'Deep, even black paint' }]);
    expect((await show.car('Merc').owner.client.get(url)).status).toBe(404);
    expect((await (await apiClient()).get(url)).status).toBe(401);
  });
});

describe('hand tie-breaks', () => {
  it('flags a tie the rules leave shared; the organiser orders it with a reason, recorded in the audit', async () => {
    const show = await scoredShow();
    const [deuce, flathead] = [show.car('Deuce'), show.car('Flathead')];
    const reviewUrl = `/api/events/${show.eventId}/results/review`;
    const review = (await show.organiser.client.get(reviewUrl)).body;
    expect(review.review.ties).toEqual([{ scope: 'class', classId: deuce.classId, place: 1, numbers: [deuce.number, flathead.number].sort((a, b) => a - b), cars: expect.any(Array) }]);

    const url = `/api/events/${show.eventId}/results/tie-breaks`;
    const noReason = await show.organiser.client.post(url, { entryIds: [flathead.id, deuce.id], reason: '' });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.fields.reason).toMatch(/Say why/);
    const notATie = await show.organiser.client.post(url, { entryIds: [flathead.id, show.car('Ratrod').id], reason: 'Better stance' });
    expect(notATie.status).toBe(400);
    expect(notATie.body.error.fields.entryIds).toMatch(/not one of the ties/);
    expect((await show.judges[0]!.client.post(url, { entryIds: [flathead.id, deuce.id], reason: 'Better stance' })).status).toBe(403);

    // An order made and taken back leaves the tie shared again, with an audit line for each.
    const first = await show.organiser.client.post(url, { entryIds: [deuce.id, flathead.id], reason: 'Better stance' });
    expect(first.status).toBe(201);
    expect((await show.judges[0]!.client.delete(`${url}/${first.body.tieBreak.id}`)).status).toBe(403);
    expect((await show.organiser.client.delete(`${url}/${first.body.tieBreak.id}`)).status).toBe(204);
    expect((await show.organiser.client.get(reviewUrl)).body.review.ties).toHaveLength(1);

    const made = await show.organiser.client.post(url, { entryIds: [flathead.id, deuce.id], reason: 'Cleaner underside on a second look' });
    expect(made.status).toBe(201);
    const after = (await show.organiser.client.get(reviewUrl)).body;
    expect(after.review.ties).toEqual([]);
    const hotRods = after.review.classes.find((c: { classId: number }) => c.classId === deuce.classId);
    expect(hotRods.placings.map((l: { title: string; place: number; decidedBy: string }) => [l.title, l.place, l.decidedBy])).toEqual([
      ['Flathead', 1, 'placed by the organiser: Cleaner underside on a second look'],
      ['Deuce', 2, 'placed by the organiser: Cleaner underside on a second look'],
      ['Ratrod', 3, 'score'],
    ]);
    expect(after.tieBreaks).toEqual([expect.objectContaining({ numbers: [flathead.number, deuce.number], reason: 'Cleaner underside on a second look', by: 'Org Anizer' })]);
    const audit = (await show.organiser.client.get(`/api/events/${show.eventId}/audit`)).body.audit;
    const line = audit.find((a: { action: string }) => a.action === 'tie_ordered_by_hand');
    expect(line).toBeDefined();
    expect(JSON.stringify(line)).toContain('Cleaner underside on a second look');
    expect(audit.find((a: { action: string }) => a.action === 'tie_order_removed')).toBeDefined();

    expect((await show.publish()).status).toBe(200);
    const pub = (await (await apiClient()).get(`/api/public/events/${show.slug}`)).body.event.results.classes[0];
    expect(pub.placings.map((l: { title: string; place: number; shared: boolean }) => [l.title, l.place, l.shared])).toEqual([
      ['Flathead', 1, false],
      ['Deuce', 2, false],
      ['Ratrod', 3, false],
    ]);
    // The organiser's review now shows what was published, with how each place was decided.
    const published = (await show.organiser.client.get(reviewUrl)).body;
    expect(published.published).toBe(true);
    expect(published.review.classes.find((c: { classId: number }) => c.classId === deuce.classId).placings.map((l: { title: string; place: number; decidedBy: string }) => [l.title, l.place, l.decidedBy])).toEqual(
      hotRods.placings.map((l: { title: string; place: number; decidedBy: string }) => [l.title, l.place, l.decidedBy]),
    );
  });
});

describe('the score export', () => {
  it('is every score as CSV for organisers only: BOM, header, numbers as numbers, formulas escaped', async () => {
    const show = await judgedShow({ hotRods: ['Deuce'], customs: ['Merc'] });
    await show.score(0, 'Deuce', [8, 6, 4], ['=HYPERLINK("x")', '', '']);
    await show.score(1, 'Deuce', [7, 5, 3]);
    await show.score(0, 'Merc', [10, 9, 5]);
    const url = `/api/events/${show.eventId}/results/scores.csv`;
    expect((await show.judges[0]!.client.get(url)).status).toBe(403);
    expect((await show.car('Deuce').owner.client.get(url)).status).toBe(404);
    const res = await show.organiser.client.get(url).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    const body = (res.body as Buffer).toString('utf8');
    expect(body.charCodeAt(0)).toBe(0xfeff);
    const lines = body.slice(1).trim().split(/\r?\n/);
    expect(lines[0]).toBe('Number,Car,Class,Judge,Criterion,Points,Max points,Weight,Sheet finished,Comment,"Scored at (UTC, judge’s device)"');
    expect(lines).toHaveLength(1 + 9);
    const n = show.car('Deuce').number;
    expect(lines[1]).toMatch(new RegExp(`^${n},Deuce,Hot rods,Ada Marsh,Paint and body,8,10,2,yes,"'=HYPERLINK\\(""x""\\)",`));
    expect(lines).toContainEqual(expect.stringMatching(new RegExp(`^${n},Deuce,Hot rods,Bo Lindqvist,Engine bay,5,10,1.5,yes,,`)));
  });
});

describe('the results sheet and certificates', () => {
  it('print true Letter and A4 pages with the winners, for organisers once results are published', async () => {
    const show = await scoredShow();
    const sheetUrl = `/api/events/${show.eventId}/results/sheet.pdf`;
    expect((await show.organiser.client.get(sheetUrl)).status).toBe(409);
    expect((await show.publish()).status).toBe(200);
    expect((await show.judges[0]!.client.get(sheetUrl)).status).toBe(403);
    const pdf = async (url: string) => {
      const res = await show.organiser.client.get(url).buffer(true).parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
      expect(res.status, url).toBe(200);
      expect(res.headers['content-type']).toBe('application/pdf');
      return res.body as Buffer;
    };
    const letter = await pdf(`${sheetUrl}?paper=letter`);
    expect(mediaBoxes(letter)).toEqual([[0, 0, 612, 792]]);
    const a4 = await pdf(`${sheetUrl}?paper=a4`);
    expect(mediaBoxes(a4)[0]!.map((v) => Math.round(v * 100) / 100)).toEqual([0, 0, 595.28, 841.89]);
    // Headings print in capitals (a text transform), so the words are compared without case.
    const text = (await pdfText(a4)).toLowerCase();
    for (const s of ['Best of show', 'Merc', '40.00', 'Hot rods', 'Deuce', 'Flathead', '1st (shared)', 'Lead sled', '20.50']) expect(text).toContain(s.toLowerCase());
    expect(text.indexOf('merc')).toBeLessThan(text.indexOf('hot rods')); // best of show comes first

    const awards = (await show.organiser.client.get(`/api/events/${show.eventId}/results/awards`)).body.awards;
    expect(awards.map((a: { name: string; winners: unknown[] }) => [a.name, a.winners.length])).toEqual([
      ['Best of show', 1],
      ['1st place, Hot rods', 2],
      ['3rd place, Hot rods', 1],
      ['1st place, Customs', 1],
    ]);
    const all = await pdf(`/api/events/${show.eventId}/results/certificates.pdf?paper=a4`);
    expect(mediaBoxes(all)).toHaveLength(5);
    const best = await pdf(`/api/events/${show.eventId}/results/certificates.pdf?paper=letter&award=best-of-show`);
    expect(mediaBoxes(best)).toEqual([[0, 0, 612, 792]]);
    const bestText = await pdfText(best);
    expect(bestText).toContain('Merc');
    expect(bestText).toMatch(/Best of show/i);
    expect((await show.organiser.client.get(`/api/events/${show.eventId}/results/certificates.pdf?award=class:999:1`)).status).toBe(404);
    expect((await show.organiser.client.get(`${sheetUrl}?paper=tabloid`)).status).toBe(400);
  });
});

describe('result rules', () => {
  it('are set by organisers, checked, and refused to others', async () => {
    const show = await judgedShow({ hotRods: ['Deuce'], customs: [] });
    const url = `/api/events/${show.eventId}/results/rules`;
    const bad = await show.organiser.client.put(url, { ...RULES, shareCommentsWithEntrants: true, trimFromSheets: 3 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.trimFromSheets).toMatch(/at least 5/);
    const ok = await show.organiser.client.put(url, { ...RULES, shareCommentsWithEntrants: false, trimFromSheets: 5, printPaper: 'a4' });
    expect(ok.status).toBe(200);
    expect((await show.organiser.client.get(url)).body.rules).toEqual({ ...RULES, shareCommentsWithEntrants: false, trimFromSheets: 5, printPaper: 'a4' });
    expect((await show.judges[0]!.client.put(url, RULES)).status).toBe(403);
    const stranger = await signedIn();
    expect((await stranger.client.get(url)).status).toBe(404);
  });
});
