import { Op, type Transaction } from 'sequelize';
import type { EventStatus } from '@shared/constants';
import { EVENT_ACTIONS, settingsEditable, type EventAction } from '@shared/event-lifecycle';
import { eventDateProblems, type EventCreateInput, type EventUpdateInput } from '@shared/schemas/show';
import { Event } from '../../models/event';
import { EventClass } from '../../models/event-class';
import { Criterion } from '../../models/criterion';
import { EventMembership } from '../../models/event-membership';
import { ConflictError, NotFoundError, ValidationError } from '../../errors';
import { writeAudit } from '../audit/audit';
import { offerFreedPlaces } from '../entries/waitlist';
import { withTransaction } from '../../db/transaction';

type Person = { id: number };

const withSheet = { include: [{ model: EventClass, as: 'classes' }, { model: Criterion, as: 'criteria' }], order: [[{ model: EventClass, as: 'classes' }, 'position', 'ASC'], [{ model: EventClass, as: 'classes' }, 'id', 'ASC'], [{ model: Criterion, as: 'criteria' }, 'position', 'ASC']] } as const;

export async function findEvent(id: number, transaction?: Transaction): Promise<Event> {
  const event = await Event.findByPk(id, { transaction });
  if (!event) throw new NotFoundError('No such show.');
  return event;
}

/** The show with its classes and judging sheet in order. */
export async function loadEventDetail(id: number): Promise<Event> {
  const event = await Event.findByPk(id, withSheet as never);
  if (!event) throw new NotFoundError('No such show.');
  return event;
}

export const findEventBySlug = (slug: string) => Event.findOne({ where: { slug }, ...(withSheet as object) });

const toRow = (input: EventCreateInput | EventUpdateInput) => {
  const { startsAt, endsAt, registrationOpensAt, registrationClosesAt, ...rest } = input;
  const date = (s: string | undefined) => (s === undefined ? undefined : new Date(s));
  const row = { ...rest, startsAt: date(startsAt), endsAt: date(endsAt), registrationOpensAt: date(registrationOpensAt), registrationClosesAt: date(registrationClosesAt) };
  return Object.fromEntries(Object.entries(row).filter(([, v]) => v !== undefined));
};

/** A new show in draft; whoever creates it becomes its first organiser. */
export async function createEvent(person: Person, input: EventCreateInput, outer?: Transaction): Promise<Event> {
  return withTransaction(outer, async (transaction) => {
    const event = await Event.create({ ...(toRow(input) as unknown as EventCreateInput & { startsAt: Date; endsAt: Date; registrationOpensAt: Date; registrationClosesAt: Date }), createdBy: person.id }, { transaction });
    await EventMembership.create({ eventId: event.id, userId: person.id, role: 'organiser' }, { transaction });
    await writeAudit({ eventId: event.id, actorId: person.id, action: 'show_created', after: { status: 'draft', name: event.name } }, transaction);
    return event;
  });
}

/** Changes settings; the date rules are checked on the result, and a larger capacity offers freed places. */
export async function updateEvent(eventId: number, person: Person, input: EventUpdateInput, outer?: Transaction): Promise<void> {
  await withTransaction(outer, async (transaction) => {
    const event = await Event.findByPk(eventId, { lock: transaction.LOCK.UPDATE, transaction });
    if (!event) throw new NotFoundError('No such show.');
    if (!settingsEditable(event.status)) throw new ConflictError('An archived show cannot change.');
    const iso = (d: Date) => d.toISOString();
    const merged = {
      startsAt: input.startsAt ?? iso(event.startsAt),
      endsAt: input.endsAt ?? iso(event.endsAt),
      registrationOpensAt: input.registrationOpensAt ?? iso(event.registrationOpensAt),
      registrationClosesAt: input.registrationClosesAt ?? iso(event.registrationClosesAt),
    };
    const problems = eventDateProblems(merged);
    if (Object.keys(problems).length) throw new ValidationError(problems);
    const row = toRow(input);
    const before = Object.fromEntries(Object.keys(row).map((k) => [k, event.get(k as keyof Event)]));
    await event.update(row, { transaction });
    await writeAudit({ eventId, actorId: person.id, action: 'settings_changed', before, after: row }, transaction);
    if ('capacity' in row) await offerFreedPlaces(eventId, transaction);
  });
}

/**
 * One step of the show's life, checked against where it is now and what the step needs, with an audit
 * line, inside the caller's transaction with the show row locked. Steps that touch other domains
 * (publishing results) are the command's (`commands/take-lifecycle-step.ts`).
 */
export async function takeLifecycleStepIn(eventId: number, person: Person, action: EventAction, transaction: Transaction): Promise<void> {
  const event = await Event.findByPk(eventId, { lock: transaction.LOCK.UPDATE, transaction });
  if (!event) throw new NotFoundError('No such show.');
  const step = EVENT_ACTIONS[action];
  if (!(step.from as readonly EventStatus[]).includes(event.status)) {
    throw new ConflictError(`“${step.label}” is not possible while the show is ${event.status.replace(/_/g, ' ')}.`, { action: 'Not possible from the show’s current step.' });
  }
  if (action === 'open_registration' && (await EventClass.count({ where: { eventId }, transaction })) === 0) {
    throw new ConflictError('Add at least one class before opening entries.', { action: 'The show has no classes yet.' });
  }
  if (action === 'start_judging' && (await Criterion.count({ where: { eventId }, transaction })) === 0) {
    throw new ConflictError('Add the judging sheet before judging starts.', { action: 'The judging sheet is empty.' });
  }
  const from = event.status;
  await event.update({ status: step.to }, { transaction });
  await writeAudit({ eventId, actorId: person.id, action, before: { status: from }, after: { status: step.to } }, transaction);
}

/** Shows the person has a role in, soonest first. */
export async function listEventsOf(person: Person) {
  const memberships = await EventMembership.findAll({ where: { userId: person.id } });
  const ids = [...new Set(memberships.map((m) => m.eventId))];
  const events = ids.length ? await Event.findAll({ where: { id: { [Op.in]: ids } }, order: [['startsAt', 'ASC'], ['id', 'ASC']] }) : [];
  return events.map((event) => ({ event, roles: memberships.filter((m) => m.eventId === event.id).map((m) => m.role) }));
}

/** Shows taking entries now, soonest first: what an owner can enter. */
export function listOpenEvents(now = new Date()) {
  return Event.findAll({
    where: { status: 'registration_open', registrationOpensAt: { [Op.lte]: now }, registrationClosesAt: { [Op.gt]: now } },
    order: [['startsAt', 'ASC'], ['id', 'ASC']],
    limit: 100,
  });
}
