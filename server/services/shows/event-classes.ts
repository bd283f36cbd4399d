import type { Transaction } from 'sequelize';
import { CLASSES_PER_EVENT_MAX } from '@shared/constants';
import { settingsEditable } from '@shared/event-lifecycle';
import type { ClassInput, ClassUpdateInput } from '@shared/schemas/show-classes';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { EventClass } from '../../models/event-class';
import { ConflictError, NotFoundError } from '../../errors';
import { writeAudit } from '../audit/audit';
import { offerFreedPlaces } from '../entries/waitlist';
import { withTransaction } from '../../db/transaction';
import { oneOfShow } from '../../db/one-of-show';

type Person = { id: number };

async function lockEditable(eventId: number, transaction: import('sequelize').Transaction) {
  const event = await Event.findByPk(eventId, { lock: transaction.LOCK.UPDATE, transaction });
  if (!event) throw new NotFoundError('No such show.');
  if (!settingsEditable(event.status)) throw new ConflictError('An archived show cannot change.');
  return event;
}

export async function addClass(eventId: number, person: Person, input: ClassInput, outer?: Transaction) {
  return withTransaction(outer, async (transaction) => {
    await lockEditable(eventId, transaction);
    const count = await EventClass.count({ where: { eventId }, transaction });
    if (count >= CLASSES_PER_EVENT_MAX) throw new ConflictError(`A show has at most ${CLASSES_PER_EVENT_MAX} classes.`);
    const cls = await EventClass.create({ eventId, name: input.name, description: input.description, capacity: input.capacity, position: input.position ?? count }, { transaction });
    await writeAudit({ eventId, actorId: person.id, action: 'class_added', after: { id: cls.id, name: cls.name, capacity: cls.capacity } }, transaction);
    return cls;
  });
}

export async function updateClass(eventId: number, classId: number, person: Person, input: ClassUpdateInput, outer?: Transaction) {
  return withTransaction(outer, async (transaction) => {
    await lockEditable(eventId, transaction);
    const cls = await oneOfShow(EventClass, classId, eventId, 'class', transaction);
    const before = { name: cls.name, description: cls.description, position: cls.position, capacity: cls.capacity };
    const { position, ...rest } = input;
    await cls.update(rest, { transaction });
    if (position !== undefined) {
      // Moving one class renumbers them all 0…n−1, so the order has no ties.
      const ordered = (await EventClass.findAll({ where: { eventId }, order: [['position', 'ASC'], ['id', 'ASC']], transaction })).filter((c) => c.id !== cls.id);
      ordered.splice(Math.min(position, ordered.length), 0, cls);
      for (const [i, c] of ordered.entries()) if (c.position !== i) await c.update({ position: i }, { transaction });
    }
    await writeAudit({ eventId, actorId: person.id, action: 'class_changed', before, after: input }, transaction);
    if ('capacity' in input) await offerFreedPlaces(eventId, transaction);
    return cls;
  });
}

/** A class with entries (even withdrawn ones, which keep their history) cannot go. */
export async function deleteClass(eventId: number, classId: number, person: Person, outer?: Transaction) {
  await withTransaction(outer, async (transaction) => {
    await lockEditable(eventId, transaction);
    const cls = await oneOfShow(EventClass, classId, eventId, 'class', transaction);
    if ((await Entry.count({ where: { classId }, transaction })) > 0) throw new ConflictError('This class has entries; it cannot be removed.', { classId: 'Has entries.' });
    await cls.destroy({ transaction });
    await writeAudit({ eventId, actorId: person.id, action: 'class_removed', before: { id: classId, name: cls.name } }, transaction);
  });
}
