// The benches' invented show morning, made in the bench server's own process on its own database:
// people (an organiser, ten judges, gate staff, owners), a show being judged with people's choice
// open, and shows of any size, their builds and entries written with bulk SQL in one transaction.
import { randomUUID } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import type { EventStatus } from '@shared/constants';

export const BENCH_PASSWORD = 'bench password for loopback only';

export type Person = { id: number; email: string };
export type SeededShow = {
  id: number;
  slug: string;
  entries: number;
  classIds: number[];
  criterionIds: number[];
  /** Entry ids the gate has checked in (judged cars), in number order. */
  judgedEntryIds: number[];
  /** Entry numbers still expected at the gate, in number order. */
  expectedNumbers: number[];
  /** A word in about one title in twenty, and one that is in exactly one title. */
  commonWord: string;
  rareWord: string;
};

const DAY = 86_400_000;
// Invented words for titles: body styles and nicknames, no makers.
const BODIES = ['roadster', 'coupe', 'fastback', 'sedan', 'pickup', 'wagon', 'hardtop', 'gasser', 'panel van', 'convertible'];
const NICKNAMES = ['Ember', 'Juniper', 'Falcon', 'Copperhead', 'Nightjar', 'Saltflat', 'Tin Goose', 'Blue Heron', 'Dust Devil', 'Old Faithful', 'Kestrel', 'Marigold', 'Thunder Moth', 'Sand Piper', 'Red Fern', 'Iron Lark', 'Foxglove', 'Morning Star', 'Wildcat', 'Lantern'];
export const RARE_WORD = 'Quillback';

async function models() {
  const { sequelize } = await import('@server/db/sequelize');
  const { User } = await import('@server/models/user');
  const { EventClass } = await import('@server/models/event-class');
  const { EventMembership } = await import('@server/models/event-membership');
  const { Criterion } = await import('@server/models/criterion');
  const { JudgeAssignment } = await import('@server/models/judge-assignment');
  const { Event } = await import('@server/models/event');
  return { sequelize, User, EventClass, EventMembership, Criterion, JudgeAssignment, Event };
}

let hash: Promise<string> | undefined;

/** People with the bench password (one hash made once), e-mail confirmed. */
export async function people(label: string, count: number, flags: { mayOrganise?: boolean } = {}): Promise<Person[]> {
  const { User } = await models();
  hash ??= import('@server/auth/passwords').then((m) => m.hashPassword(BENCH_PASSWORD));
  const passwordHash = await hash;
  const rows = await User.bulkCreate(
    Array.from({ length: count }, (_, i) => ({ email: `${label}-${i + 1}-${randomUUID().slice(0, 6)}@example.test`, name: `${label[0]!.toUpperCase()}${label.slice(1)} ${i + 1}`, passwordHash, isSiteAdmin: false, mayOrganise: flags.mayOrganise ?? false, emailVerifiedAt: new Date() })),
  );
  return rows.map((u) => ({ id: u.id, email: u.email }));
}

/**
 * A show of `entries` cars, today: `checkedIn` of them checked in (the rest confirmed, expected at the
 * gate), four classes, a three-line sheet, its judges judging every class, its gate staff, and people's
 * choice open when asked. Builds and entries are inserted by two SQL statements in one transaction.
 */
export async function seedShow(opts: { name: string; entries: number; status: EventStatus; organiser: Person; owner: Person; checkedIn?: number; judges?: Person[]; gate?: Person[]; votingOpen?: boolean; firstBuildId?: number }): Promise<SeededShow> {
  const { sequelize, EventClass, EventMembership, Criterion, JudgeAssignment, Event } = await models();
  const { createEvent } = await import('@server/services/shows/events');
  const { randomBuildCode } = await import('@server/services/builds/build-codes');
  const now = Date.now();
  const slug = `${opts.name.toLowerCase().replace(/[^a-z0-9]+/g, '-').slice(0, 40)}-${randomUUID().slice(0, 6)}`;
  const show = await createEvent(opts.organiser, {
    name: opts.name,
    slug,
    venueName: 'The old brickworks field',
    venueAddress: 'Kiln Lane 4, Harrowby',
    timeZone: 'Europe/London',
    startsAt: new Date(now - 2 * 3600_000).toISOString(),
    endsAt: new Date(now + 8 * 3600_000).toISOString(),
    registrationOpensAt: new Date(now - 40 * DAY).toISOString(),
    registrationClosesAt: new Date(now - 3 * 3600_000).toISOString(),
    capacity: null,
    entryFee: 0,
    currency: 'EUR',
    refundRule: { fullRefundUntil: new Date(now - 10 * DAY).toISOString(), afterwardsPercent: 0 },
    description: 'An invented show for the benchmark.',
  } as never);
  const classes = await EventClass.bulkCreate(['Early iron', 'Post-war customs', 'Muscle and restomods', 'Trucks and wagons'].map((name, position) => ({ eventId: show.id, name, description: '', position, capacity: null })));
  const criteria = await Criterion.bulkCreate(
    [
      { name: 'Paint and body', maxPoints: 10, weight: 2, tieBreakOrder: 1 },
      { name: 'Engine bay', maxPoints: 10, weight: 1.5, tieBreakOrder: 2 },
      { name: 'Interior', maxPoints: 5, weight: 1, tieBreakOrder: null },
    ].map((c, position) => ({ eventId: show.id, ...c, position })),
  );
  const classIds = classes.map((c) => c.id);
  const checkedIn = Math.min(opts.checkedIn ?? 0, opts.entries);
  await sequelize.transaction(async (transaction) => {
    const n = opts.entries - (opts.firstBuildId ? 1 : 0);
    const codes = Array.from({ length: n }, () => randomBuildCode());
    const titles = Array.from({ length: n }, (_, i) => (i === 6 ? `${1932 + (i % 40)} ${RARE_WORD} ${BODIES[i % BODIES.length]}` : `${1932 + (i % 40)} ${NICKNAMES[i % NICKNAMES.length]} ${BODIES[(i >> 1) % BODIES.length]} ${i + 1}`));
    const built = await sequelize.query<{ id: number }>(
      `INSERT INTO builds (owner_id, code, title, model_year, story, credits, published, created_at, updated_at)
       SELECT :owner, c, t, 1932 + (o % 40)::int, '', '[]'::jsonb, true, now(), now()
       FROM unnest(ARRAY[:codes]::text[], ARRAY[:titles]::text[]) WITH ORDINALITY AS x(c, t, o) ORDER BY o RETURNING id`,
      { replacements: { owner: opts.owner.id, codes, titles }, type: QueryTypes.SELECT, transaction },
    );
    const buildIds = [...(opts.firstBuildId ? [opts.firstBuildId] : []), ...built.map((b) => b.id).sort((a, b) => a - b)];
    await sequelize.query(
      `INSERT INTO entries (event_id, build_id, class_id, owner_id, number, status, fee_amount, currency, checked_in_at, created_at, updated_at)
       SELECT :event, b, (ARRAY[:classIds]::int[])[1 + ((o - 1) % :classCount)], :owner, o,
              CASE WHEN o <= :checkedIn THEN 'checked_in' ELSE 'confirmed' END, 0, 'EUR',
              CASE WHEN o <= :checkedIn THEN now() - interval '1 hour' END, now(), now()
       FROM unnest(ARRAY[:buildIds]::int[]) WITH ORDINALITY AS x(b, o)`,
      { replacements: { event: show.id, classIds, classCount: classIds.length, owner: opts.owner.id, checkedIn, buildIds }, transaction },
    );
    await Event.update({ status: opts.status, lastEntryNumber: opts.entries, peoplesChoiceOpenedAt: opts.votingOpen ? new Date(now - 3600_000) : null }, { where: { id: show.id }, transaction });
    for (const j of opts.judges ?? []) {
      await EventMembership.create({ eventId: show.id, userId: j.id, role: 'judge' }, { transaction });
      await JudgeAssignment.create({ eventId: show.id, judgeId: j.id, classId: null }, { transaction });
    }
    for (const g of opts.gate ?? []) await EventMembership.create({ eventId: show.id, userId: g.id, role: 'gate' }, { transaction });
  });
  const ids = await sequelize.query<{ id: number; number: number; status: string }>('SELECT id, number, status FROM entries WHERE event_id = :event ORDER BY number', { replacements: { event: show.id }, type: QueryTypes.SELECT });
  return {
    id: show.id,
    slug,
    entries: opts.entries,
    classIds,
    criterionIds: criteria.map((c) => c.id),
    judgedEntryIds: ids.filter((e) => e.status === 'checked_in').map((e) => e.id),
    expectedNumbers: ids.filter((e) => e.status === 'confirmed').map((e) => e.number),
    commonWord: NICKNAMES[3]!,
    rareWord: RARE_WORD,
  };
}
