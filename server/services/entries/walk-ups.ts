import { randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import type { WalkUpInput } from '@shared/schemas/show-day';
import { withTransaction } from '../../db/transaction';
import { Build } from '../../models/build';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { EventClass } from '../../models/event-class';
import { ConflictError, NotFoundError, ValidationError } from '../../errors';
import { writeAudit } from '../audit/audit';
import { newBuildCode } from '../builds/build-codes';
import { takeNumber } from './entries';
import { hasRoom } from './waitlist';

type Person = { id: number };

/**
 * A car that was not entered, entered at the gate on show day: it gets the next number, is paid in
 * cash (when the show has a fee) and checked in, in one transaction with the show's row locked, so
 * it never takes a place the show does not have. The entrant has no account here: the car becomes an
 * unpublished build of the show's organiser (nothing of it is on a public page), and the entrant's
 * name and e-mail stay on the entry, for the organisers only. No mail is sent: the card is printed there.
 */
export async function enterWalkUp(eventId: number, input: WalkUpInput, person: Person, now = new Date(), outer?: Transaction): Promise<Entry> {
  return withTransaction(outer, async (transaction) => {
    const event = await Event.findByPk(eventId, { lock: transaction.LOCK.UPDATE, transaction });
    if (!event) throw new NotFoundError('No such show.');
    const cls = await EventClass.findOne({ where: { id: input.classId, eventId }, transaction });
    if (!cls) throw new ValidationError({ classId: 'This show has no such class.' });
    if (!(await hasRoom(event, cls.id, now, transaction))) {
      throw new ConflictError(`No place left in ${event.capacity !== null ? 'this show' : cls.name}: a walk-up cannot be entered.`, { classId: 'Full.' });
    }
    const build = await Build.create(
      { ownerId: event.createdBy ?? person.id, code: await newBuildCode(transaction), title: input.title, modelYear: null, bodyOrigin: null, style: null, weight: null, vin: null, plate: null, ownerPhone: null, ownerAddress: null },
      { transaction },
    );
    const paid = event.entryFee > 0;
    const entry = await Entry.create(
      {
        eventId,
        buildId: build.id,
        classId: cls.id,
        ownerId: build.ownerId,
        number: await takeNumber(event, transaction),
        status: 'checked_in',
        feeAmount: event.entryFee,
        currency: event.currency,
        paymentRef: paid ? `manual:${randomUUID()}` : null,
        paidAt: paid ? now : null,
        paidAmount: paid ? event.entryFee : null,
        checkedInAt: now,
        walkUpName: input.entrantName,
        walkUpEmail: input.email || null,
      },
      { transaction },
    );
    await writeAudit({ eventId, entryId: entry.id, actorId: person.id, action: 'entry_created', after: { status: 'checked_in', number: entry.number, classId: cls.id, walkUp: true } }, transaction);
    if (paid) await writeAudit({ eventId, entryId: entry.id, actorId: person.id, action: 'marked_paid', after: { status: 'checked_in', paymentRef: entry.paymentRef, paidAmount: entry.paidAmount, note: 'Walk-up: cash taken at the gate.' } }, transaction);
    await writeAudit({ eventId, entryId: entry.id, actorId: person.id, action: 'checked_in', after: { status: 'checked_in', cashTaken: paid } }, transaction);
    return entry;
  });
}
