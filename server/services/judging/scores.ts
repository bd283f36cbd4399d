import { Op, QueryTypes, type Transaction } from 'sequelize';
import { DEVICE_CLOCK_AHEAD_MAX_MS, EXPECTED_ENTRY_STATUSES, JUDGED_ENTRY_STATUSES, notArrivedReason, type ScoreApplied, type ScoreSubmitInput } from '@shared/schemas/judging';
import { sequelize } from '../../db/sequelize';
import { Criterion } from '../../models/criterion';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { AppError, ConflictError, NotFoundError, ValidationError } from '../../errors';
import { classesOfJudge, judgesClass } from './judge-assignments';
import { writeAudit } from '../audit/audit';
import { withTransaction } from '../../db/transaction';

/** Why a score is refused when the show no longer takes them, in words the judge's phone shows as they are. */
export function judgingClosedReason(event: Pick<Event, 'status' | 'judgingClosedAt'>): string | null {
  if (event.status === 'judging' && !event.judgingClosedAt) return null;
  if (event.status === 'judging') return 'Judging is closed: the organiser has locked the scores, so this change was not recorded.';
  if (event.status === 'results_published' || event.status === 'archived') return 'Results are published: scores are locked, so this change was not recorded.';
  return 'Judging has not started for this show yet.';
}

/*
 * One clock: the server's. The same phone's lines are ordered by that phone's own sequence (its clock
 * orders nothing but its queue), and a line from another phone of the judge wins because the server
 * received it later: a phone a day fast no longer beats every later correction. Phones that send no
 * id (older versions, the demo seeders) have a null device and their device time as sequence, so they
 * keep the old rule among themselves. The client id breaks a tie so every server picks the same row.
 */
const LATER_THAN_STORED = (table: string) => `
    WHERE CASE WHEN ${table}.device_id IS NOT DISTINCT FROM EXCLUDED.device_id
      THEN (${table}.device_seq, ${table}.client_id) < (EXCLUDED.device_seq, EXCLUDED.client_id)
      ELSE true END`;
const UPSERT_SCORE = `
  INSERT INTO scores (event_id, entry_id, judge_id, criterion_id, points, comment, device_time, client_id, device_id, device_seq, received_at, created_at, updated_at)
  VALUES (:eventId, :entryId, :judgeId, :criterionId, :points, :comment, :deviceTime, :clientId, :deviceId, :deviceSeq, now(), now(), now())
  ON CONFLICT (entry_id, judge_id, criterion_id) DO UPDATE
    SET points = EXCLUDED.points, comment = EXCLUDED.comment, device_time = EXCLUDED.device_time, client_id = EXCLUDED.client_id,
        device_id = EXCLUDED.device_id, device_seq = EXCLUDED.device_seq, received_at = now(), updated_at = now()
    ${LATER_THAN_STORED('scores')}
  RETURNING id`;
const UPSERT_NOTE = `
  INSERT INTO sheet_notes (event_id, entry_id, judge_id, comment, device_time, client_id, device_id, device_seq, received_at, created_at, updated_at)
  VALUES (:eventId, :entryId, :judgeId, :comment, :deviceTime, :clientId, :deviceId, :deviceSeq, now(), now(), now())
  ON CONFLICT (entry_id, judge_id) DO UPDATE
    SET comment = EXCLUDED.comment, device_time = EXCLUDED.device_time, client_id = EXCLUDED.client_id,
        device_id = EXCLUDED.device_id, device_seq = EXCLUDED.device_seq, received_at = now(), updated_at = now()
    ${LATER_THAN_STORED('sheet_notes')}
  RETURNING id`;
/** Every item id is remembered when first received: a send retried after its answer was lost is a replay, never a newer value. */
const RECEIPT = 'INSERT INTO score_receipts (client_id, judge_id, received_at) VALUES (:clientId, :judgeId, now()) ON CONFLICT DO NOTHING RETURNING client_id AS id';
const HOLDER_OF_SCORE = 'SELECT client_id AS "clientId", device_id AS "deviceId" FROM scores WHERE entry_id = :entryId AND judge_id = :judgeId AND criterion_id = :criterionId';
const HOLDER_OF_NOTE = 'SELECT client_id AS "clientId", device_id AS "deviceId" FROM sheet_notes WHERE entry_id = :entryId AND judge_id = :judgeId';

/**
 * Records a judge's scores and car comments: all of them or none. Every item is checked first
 * (its line on this show's sheet, points within 0…max, a judged car of the show in the judge's
 * classes, a device clock not far ahead); the show row is read FOR SHARE, so closing judging
 * (FOR UPDATE) waits for sends in flight and every later send sees it closed.
 */
export async function submitScores(eventId: number, judgeId: number, input: ScoreSubmitInput, now = new Date(), outer?: Transaction) {
  return withTransaction(outer, async (transaction) => {
    const event = await Event.findByPk(eventId, { lock: transaction.LOCK.SHARE, transaction });
    if (!event) throw new NotFoundError('No such show.');
    const closed = judgingClosedReason(event);
    if (closed) throw new ConflictError(closed);

    const criteria = new Map((await Criterion.findAll({ where: { eventId }, transaction })).map((c) => [c.id, c]));
    const entryIds = [...new Set([...input.scores, ...input.notes].map((i) => i.entryId))];
    const found = await Entry.findAll({ where: { id: { [Op.in]: entryIds }, eventId }, transaction });
    const notArrived = found.filter((e) => (EXPECTED_ENTRY_STATUSES as readonly string[]).includes(e.status));
    if (notArrived.length) throw new ConflictError(`${notArrivedReason(notArrived.map((e) => e.number as number))} Nothing in this send was recorded.`);
    const entries = new Map(found.filter((e) => (JUDGED_ENTRY_STATUSES as readonly string[]).includes(e.status)).map((e) => [e.id, e]));
    const classes = await classesOfJudge(eventId, judgeId, transaction);

    const problems: Record<string, string> = {};
    let outsideClasses = false;
    const checkCommon = (path: string, item: { entryId: number; deviceTime: string }) => {
      const entry = entries.get(item.entryId);
      if (!entry) problems[`${path}.entryId`] = 'This car is not judged in this show.';
      else if (!judgesClass(classes, entry.classId)) outsideClasses = true;
      if (new Date(item.deviceTime).getTime() - now.getTime() > DEVICE_CLOCK_AHEAD_MAX_MS) problems[`${path}.deviceTime`] = 'The phone’s clock is more than a day ahead; set its date and time, then send again.';
    };
    input.scores.forEach((s, i) => {
      checkCommon(`scores.${i}`, s);
      const criterion = criteria.get(s.criterionId);
      if (!criterion) problems[`scores.${i}.criterionId`] = 'This line is not on this show’s judging sheet.';
      else if (s.points > criterion.maxPoints) problems[`scores.${i}.points`] = `${criterion.name} scores 0 to ${criterion.maxPoints} points.`;
    });
    input.notes.forEach((n, i) => checkCommon(`notes.${i}`, n));
    if (Object.keys(problems).length) throw new ValidationError(problems, 'Some scores cannot be recorded.');
    if (outsideClasses) throw new AppError(403, 'FORBIDDEN', 'A car in this sheet is in a class you are not judging.');

    const deviceId = input.deviceId ?? null;
    const order = (item: { deviceTime: string; sequence?: number | undefined }) => ({ deviceId, deviceSeq: deviceId ? (item.sequence ?? 0) : new Date(item.deviceTime).getTime() });
    const applied: ScoreApplied[] = [];
    const lines = input.scores.map((s) => ({ entryId: s.entryId, criterionId: s.criterionId, points: s.points, comment: s.comment, deviceTime: new Date(s.deviceTime), clientId: s.clientId, ...order(s) }));
    if (canRecordAtOnce(lines)) applied.push(...(await recordScoresAtOnce(eventId, judgeId, deviceId, lines, transaction)));
    else for (const line of lines) applied.push(await record(UPSERT_SCORE, HOLDER_OF_SCORE, { eventId, judgeId, ...line }, transaction));
    for (const n of input.notes) {
      const line = { eventId, judgeId, entryId: n.entryId };
      applied.push(await record(UPSERT_NOTE, HOLDER_OF_NOTE, { ...line, comment: n.comment, deviceTime: new Date(n.deviceTime), clientId: n.clientId, ...order(n) }, transaction));
    }
    return applied;
  });
}

type ScoreLine = { entryId: number; criterionId: number; points: number; comment: string; deviceTime: Date; clientId: string; deviceId: string | null; deviceSeq: number };

/** One statement does a whole sheet only when no two lines share an id or a box (then line order cannot matter). */
function canRecordAtOnce(lines: ScoreLine[]): boolean {
  const ids = new Set(lines.map((l) => l.clientId));
  const boxes = new Set(lines.map((l) => `${l.entryId}|${l.criterionId}`));
  return lines.length > 1 && ids.size === lines.length && boxes.size === lines.length;
}

/*
 * What `record` does line by line, for every line of a sheet in one statement (one round trip, however
 * long the sheet): receipts for the new ids, the upsert for those, and for each replay the holder of its
 * box as it stood before this send (the statement's snapshot; no other line of the send wrote that box).
 */
const RECORD_SCORES_AT_ONCE = `
  WITH input AS (
    SELECT * FROM jsonb_to_recordset(CAST(:lines AS jsonb))
      AS x(i int, entry_id int, criterion_id int, points int, comment text, device_time timestamptz, client_id uuid, device_seq bigint)
  ), fresh AS (
    INSERT INTO score_receipts (client_id, judge_id, received_at)
    SELECT client_id, :judgeId, now() FROM input
    ON CONFLICT DO NOTHING RETURNING client_id
  ), written AS (
    INSERT INTO scores (event_id, entry_id, judge_id, criterion_id, points, comment, device_time, client_id, device_id, device_seq, received_at, created_at, updated_at)
    SELECT :eventId, entry_id, :judgeId, criterion_id, points, comment, device_time, client_id, CAST(:deviceId AS uuid), device_seq, now(), now(), now()
    FROM input WHERE client_id IN (SELECT client_id FROM fresh)
    ON CONFLICT (entry_id, judge_id, criterion_id) DO UPDATE
      SET points = EXCLUDED.points, comment = EXCLUDED.comment, device_time = EXCLUDED.device_time, client_id = EXCLUDED.client_id,
          device_id = EXCLUDED.device_id, device_seq = EXCLUDED.device_seq, received_at = now(), updated_at = now()
      ${LATER_THAN_STORED('scores')}
    RETURNING client_id
  )
  SELECT input.i, fresh.client_id IS NOT NULL AS "fresh", written.client_id IS NOT NULL AS "applied",
         CAST(holder.client_id AS text) AS "holderClientId", CAST(holder.device_id AS text) AS "holderDeviceId"
  FROM input
  LEFT JOIN fresh ON fresh.client_id = input.client_id
  LEFT JOIN written ON written.client_id = input.client_id
  LEFT JOIN scores holder ON fresh.client_id IS NULL AND holder.entry_id = input.entry_id AND holder.judge_id = :judgeId AND holder.criterion_id = input.criterion_id
  ORDER BY input.i`;

async function recordScoresAtOnce(eventId: number, judgeId: number, deviceId: string | null, lines: ScoreLine[], transaction: Transaction): Promise<ScoreApplied[]> {
  const json = JSON.stringify(lines.map((l, i) => ({ i, entry_id: l.entryId, criterion_id: l.criterionId, points: l.points, comment: l.comment, device_time: l.deviceTime.toISOString(), client_id: l.clientId, device_seq: l.deviceSeq })));
  const rows = await sequelize.query<{ i: number; fresh: boolean; applied: boolean; holderClientId: string | null; holderDeviceId: string | null }>(RECORD_SCORES_AT_ONCE, {
    replacements: { lines: json, eventId, judgeId, deviceId },
    type: QueryTypes.SELECT,
    transaction,
  });
  // PostgreSQL gives uuids back in lower case; a phone's id is answered as the phone wrote it.
  const lower = (id: string | null) => id?.toLowerCase() ?? null;
  return rows.map((r): ScoreApplied => {
    const clientId = lines[r.i]!.clientId;
    if (r.fresh) return { clientId, applied: r.applied };
    const replaced = r.holderClientId !== null && r.holderClientId !== lower(clientId) && r.holderDeviceId !== lower(deviceId);
    return { clientId, applied: false, ...(replaced ? { replacedByOtherDevice: true as const } : {}) };
  });
}

/** Writes one item unless it is a replay or older than the stored value; a replay says whether another phone's value replaced it. */
async function record(upsertSql: string, holderSql: string, item: Record<string, unknown> & { clientId: string; deviceId: string | null }, transaction: Transaction): Promise<ScoreApplied> {
  const query = (sql: string) => sequelize.query<{ id: number }>(sql, { replacements: item, type: QueryTypes.SELECT, transaction });
  if ((await query(RECEIPT)).length > 0) return { clientId: item.clientId, applied: (await query(upsertSql)).length > 0 };
  const [holder] = await sequelize.query<{ clientId: string; deviceId: string | null }>(holderSql, { replacements: item, type: QueryTypes.SELECT, transaction });
  const replaced = holder !== undefined && holder.clientId !== item.clientId && holder.deviceId !== item.deviceId;
  return { clientId: item.clientId, applied: false, ...(replaced ? { replacedByOtherDevice: true as const } : {}) };
}

/** Closes judging (scores refused from now on) or opens it again before results are published; an audit line either way. */
export async function setJudgingClosed(eventId: number, closed: boolean, person: { id: number }, outer?: Transaction): Promise<void> {
  await withTransaction(outer, async (transaction) => {
    const event = await Event.findByPk(eventId, { lock: transaction.LOCK.UPDATE, transaction });
    if (!event) throw new NotFoundError('No such show.');
    if (event.status !== 'judging') throw new ConflictError('Judging can be closed or reopened only while the show is being judged.');
    if (Boolean(event.judgingClosedAt) === closed) return;
    await event.update({ judgingClosedAt: closed ? new Date() : null }, { transaction });
    await writeAudit({ eventId, actorId: person.id, action: closed ? 'judging_closed' : 'judging_reopened' }, transaction);
  });
}
