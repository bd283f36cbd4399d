import { Op, literal, type Order, type WhereOptions } from 'sequelize';
import type { EntryExportQuery, EntryTableQuery } from '@shared/schemas/show-day';
import { Build } from '../../models/build';
import { Entry } from '../../models/entry';
import { EventClass } from '../../models/event-class';
import { User } from '../../models/user';
import { attachPaymentIssues } from './payment-issues';

const includes = [
  { model: Build, as: 'build', attributes: ['id', 'title', 'code', 'modelYear', 'bodyOrigin', 'vin', 'plate', 'ownerPhone', 'ownerAddress'] },
  { model: EventClass, as: 'eventClass', attributes: ['id', 'name', 'position'] },
  { model: User, as: 'owner', attributes: ['id', 'name', 'email'] },
];

/** Sort keys to columns; every order ends on the id so a page boundary is stable. */
function orderFor(sort: EntryTableQuery['sort'], dir: 'asc' | 'desc'): Order {
  const d = dir.toUpperCase();
  const nulls = dir === 'asc' ? 'ASC NULLS LAST' : 'DESC NULLS FIRST';
  switch (sort) {
    case 'title':
      return [[{ model: Build, as: 'build' }, 'title', d], ['id', 'ASC']];
    case 'owner':
      // The entrant's name: a walk-up's own, else the owner's.
      return [[literal('COALESCE("Entry"."walk_up_name", "owner"."name")'), d], ['id', 'ASC']];
    case 'class':
      return [[{ model: EventClass, as: 'eventClass' }, 'position', d], ['number', 'ASC NULLS LAST'], ['id', 'ASC']];
    case 'status':
      return [['status', d], ['number', 'ASC NULLS LAST'], ['id', 'ASC']];
    case 'created':
      return [['createdAt', d], ['id', 'ASC']];
    case 'number':
      return [['number', nulls], ['waitlistedAt', 'ASC'], ['id', 'ASC']];
  }
}

/** Filters and the search box: title, entrant's name or e-mail, or an entry number typed as digits. */
function whereFor(eventId: number, q: EntryExportQuery): WhereOptions {
  const where: Record<string | symbol, unknown> = { eventId };
  if (q.classId) where.classId = q.classId;
  if (q.status) where.status = q.status;
  const text = q.q?.trim();
  if (text) {
    // Digits alone are an entry number (the way the gate and the phone call ask for a car).
    if (/^\d{1,6}$/.test(text)) where.number = Number(text);
    else {
      const like = `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
      where[Op.or] = [
        { '$build.title$': { [Op.iLike]: like } },
        { '$owner.name$': { [Op.iLike]: like }, walkUpName: null },
        { '$owner.email$': { [Op.iLike]: like }, walkUpName: null },
        { walkUpName: { [Op.iLike]: like } },
        { walkUpEmail: { [Op.iLike]: like } },
      ];
    }
  }
  return where as WhereOptions;
}

/** Each waiting entry's place in line in this show (1 = next to be offered). */
export async function waitingPlaces(eventId: number): Promise<Map<number, number>> {
  const waiting = await Entry.findAll({ where: { eventId, status: 'waiting_list' }, attributes: ['id'], order: [['waitlistedAt', 'ASC'], ['id', 'ASC']] });
  return new Map(waiting.map((w, i) => [w.id, i + 1]));
}

/** One page of the table; the count runs on the same filters. Quick at thousands of entries: two indexed queries. */
export async function listEntryTable(eventId: number, q: EntryTableQuery) {
  const where = whereFor(eventId, q);
  const [total, rows, places] = await Promise.all([
    Entry.count({ where, include: includes.map((i) => ({ ...i, attributes: [] })), distinct: true, col: 'id' }),
    Entry.findAll({ where, include: includes, order: orderFor(q.sort, q.dir), limit: q.pageSize, offset: (q.page - 1) * q.pageSize, subQuery: false }),
    waitingPlaces(eventId),
  ]);
  await attachPaymentIssues(rows);
  return { rows, total, places };
}

/** Every entry that matches, in the table's order, for the CSV export. */
export async function listEntriesForExport(eventId: number, q: EntryExportQuery) {
  const [rows, places] = await Promise.all([
    Entry.findAll({ where: whereFor(eventId, q), include: includes, order: orderFor(q.sort, q.dir), subQuery: false }),
    waitingPlaces(eventId),
  ]);
  await attachPaymentIssues(rows);
  return { rows, places };
}

