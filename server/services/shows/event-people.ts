import { createHash, randomBytes } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { EVENT_ROLE_LABELS, INVITATION_TTL_DAYS, type EventRole } from '@shared/constants';
import { showInvitationEmail } from '@templates/email/show-invitation';
import { config } from '../../config';
import { Event } from '../../models/event';
import { EventInvitation } from '../../models/event-invitation';
import { EventMembership } from '../../models/event-membership';
import { User } from '../../models/user';
import { queueMail } from '../../mail/outbox';
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from '../../errors';
import { writeAudit } from '../audit/audit';
import { withTransaction } from '../../db/transaction';

type Person = { id: number; name: string };

/** Never names the invited address: the link may be in a stranger's hands. */
export const INVITATION_FOR_ANOTHER_ADDRESS =
  'This invitation was sent to a different e-mail address than the one of this account. Sign in with the account of the invited address, or ask the organiser to invite the address of this account.';
const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');

export function listMembers(eventId: number) {
  return EventMembership.findAll({ where: { eventId }, include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }], order: [['role', 'ASC'], ['id', 'ASC']] });
}

/** Invitations still waiting for an answer. */
export function listOpenInvitations(eventId: number) {
  return EventInvitation.findAll({
    where: { eventId, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: new Date() } },
    include: [{ model: User, as: 'inviter', attributes: ['name'] }],
    order: [['id', 'DESC']],
  });
}

/** Mails a single-use link; only its hash is kept. */
export async function inviteToEvent(eventId: number, person: Person, email: string, role: EventRole, outer?: Transaction) {
  return withTransaction(outer, async (transaction) => {
    const event = await Event.findByPk(eventId, { transaction });
    if (!event) throw new NotFoundError('No such show.');
    const invitee = await User.findOne({ where: { email }, attributes: ['id'], transaction });
    if (invitee && (await EventMembership.count({ where: { eventId, userId: invitee.id, role }, transaction }))) {
      throw new ConflictError('That person already has this role in the show.', { email: 'Already has this role.' });
    }
    const token = randomBytes(32).toString('base64url');
    const invitation = await EventInvitation.create(
      { eventId, email, role, tokenHash: sha256(token), expiresAt: new Date(Date.now() + INVITATION_TTL_DAYS * 86400_000), invitedBy: person.id },
      { transaction },
    );
    await writeAudit({ eventId, actorId: person.id, action: 'person_invited', after: { invitationId: invitation.id, role } }, transaction);
    const link = `${config.publicBaseUrl}/invitations/${token}`;
    await queueMail({ to: email, ...showInvitationEmail({ showName: event.name, roleLabel: EVENT_ROLE_LABELS[role], inviterName: person.name, link, days: INVITATION_TTL_DAYS }) }, { transaction, dedupeKey: `invitation:${invitation.id}` });
    return (await EventInvitation.findByPk(invitation.id, { include: [{ model: User, as: 'inviter', attributes: ['name'] }], transaction }))!;
  });
}

export async function revokeInvitation(eventId: number, invitationId: number, person: Person, outer?: Transaction) {
  await withTransaction(outer, async (transaction) => {
    const inv = await EventInvitation.findOne({ where: { id: invitationId, eventId, acceptedAt: null, revokedAt: null }, lock: transaction.LOCK.UPDATE, transaction });
    if (!inv) throw new NotFoundError('No open invitation with that id.');
    await inv.update({ revokedAt: new Date() }, { transaction });
    await writeAudit({ eventId, actorId: person.id, action: 'invitation_revoked', before: { invitationId, role: inv.role } }, transaction);
  });
}

const stateOf = (inv: EventInvitation, now = new Date()) => (inv.acceptedAt ? 'used' : inv.revokedAt ? 'revoked' : inv.expiresAt <= now ? 'expired' : 'open');

/** What the link offers, for the page the invitee lands on (signed in or not). */
export async function previewInvitation(token: string) {
  const inv = await EventInvitation.findOne({ where: { tokenHash: sha256(token) }, include: [{ model: Event, as: 'event', attributes: ['name', 'slug'] }] });
  if (!inv || !inv.event) throw new NotFoundError('This invitation link is not valid.');
  return { eventName: inv.event.name, eventSlug: inv.event.slug, role: inv.role, expiresAt: inv.expiresAt.toISOString(), state: stateOf(inv) };
}

/**
 * The address an open invitation was sent to, else null. Holding the link proves that address: the mail
 * went there. Sign-up reads it to confirm a new account with that address at once.
 */
export async function openInvitationAddress(token: string): Promise<string | null> {
  const inv = await EventInvitation.findOne({ where: { tokenHash: sha256(token) }, attributes: ['email', 'acceptedAt', 'revokedAt', 'expiresAt'] });
  return inv && stateOf(inv) === 'open' ? inv.email : null;
}

const sameAddress = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

/**
 * The signed-in person takes the role; the link is spent. Only the account whose confirmed address is the
 * invited one may: a link forwarded to someone else is refused, and stays open for the invited person.
 */
export async function acceptInvitation(token: string, person: { id: number; email: string; emailVerified: boolean }, outer?: Transaction) {
  return withTransaction(outer, async (transaction) => {
    const inv = await EventInvitation.findOne({ where: { tokenHash: sha256(token) }, lock: transaction.LOCK.UPDATE, transaction });
    if (!inv) throw new NotFoundError('This invitation link is not valid.');
    const state = stateOf(inv);
    if (state !== 'open') throw new ValidationError({ token: state === 'used' ? 'This invitation was already used.' : state === 'expired' ? 'This invitation has expired; ask for a new one.' : 'This invitation was withdrawn.' }, 'This invitation cannot be used.');
    if (!person.emailVerified || !sameAddress(person.email, inv.email)) throw new ForbiddenError(INVITATION_FOR_ANOTHER_ADDRESS);
    await inv.update({ acceptedAt: new Date(), acceptedBy: person.id }, { transaction });
    const [membership] = await EventMembership.findOrCreate({ where: { eventId: inv.eventId, userId: person.id, role: inv.role }, transaction });
    await writeAudit({ eventId: inv.eventId, actorId: person.id, action: 'invitation_accepted', after: { invitationId: inv.id, role: inv.role, userId: person.id } }, transaction);
    return membership;
  });
}

/** Removes one role of one person; the show always keeps at least one organiser. */
export async function removeMember(eventId: number, userId: number, role: EventRole, person: Person, outer?: Transaction) {
  await withTransaction(outer, async (transaction) => {
    await Event.findByPk(eventId, { lock: transaction.LOCK.UPDATE, transaction });
    const membership = await EventMembership.findOne({ where: { eventId, userId, role }, transaction });
    if (!membership) throw new NotFoundError('That person has no such role in this show.');
    if (role === 'organiser' && (await EventMembership.count({ where: { eventId, role: 'organiser' }, transaction })) <= 1) {
      throw new ConflictError('A show needs at least one organiser: invite another before this one leaves.', { userId: 'The last organiser cannot leave.' });
    }
    await membership.destroy({ transaction });
    await writeAudit({ eventId, actorId: person.id, action: 'member_removed', before: { userId, role } }, transaction);
  });
}
