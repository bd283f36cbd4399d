import { Router } from 'express';
import { z } from 'zod';
import { EVENT_ROLES } from '@shared/constants';
import { InvitationCreateSchema, InvitationTokenSchema } from '@shared/schemas/show-people';
import { IdParamSchema, IdSchema } from '@shared/schemas/params';
import { parseBody, parseParams } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorize } from '../policies/authorize';
import { mayTakePartInShows } from '../policies/event';
import { acceptInvitation, inviteToEvent, listMembers, listOpenInvitations, previewInvitation, removeMember, revokeInvitation } from '../services/shows/event-people';
import { presentInvitation, presentMember, presentMembership } from '../presenters/event';
import { invitationAcceptLimiter, invitationPreviewLimiter } from '../middlewares/rate-limits';
import { loadEventFor } from './load-for';

export const eventPeopleRouter = Router();

const MemberParamsSchema = IdParamSchema.extend({ userId: IdSchema, role: z.enum(EVENT_ROLES, { error: 'Role must be organiser, judge or gate.' }) });
const InvitationParamsSchema = IdParamSchema.extend({ invitationId: IdSchema });

eventPeopleRouter.get('/events/:id/people', requireUser, async (req, res) => {
  const { event } = await loadEventFor(req, 'manage');
  const [members, invitations] = await Promise.all([listMembers(event.id), listOpenInvitations(event.id)]);
  res.json({ members: members.map(presentMember), invitations: invitations.map(presentInvitation) });
});

eventPeopleRouter.post('/events/:id/invitations', requireUser, async (req, res) => {
  const input = parseBody(req, InvitationCreateSchema);
  const { event } = await loadEventFor(req, 'manage');
  const invitation = await inviteToEvent(event.id, currentUser(req), input.email, input.role);
  res.status(201).json({ invitation: presentInvitation(invitation) });
});

eventPeopleRouter.delete('/events/:id/invitations/:invitationId', requireUser, async (req, res) => {
  const { id, invitationId } = parseParams(req, InvitationParamsSchema);
  await loadEventFor(req, 'manage');
  await revokeInvitation(id, invitationId, currentUser(req));
  res.status(204).end();
});

/** An organiser removes someone's role; anyone may remove their own (leave), but never the last organiser. */
eventPeopleRouter.delete('/events/:id/members/:userId/:role', requireUser, async (req, res) => {
  const { id, userId, role } = parseParams(req, MemberParamsSchema);
  const user = currentUser(req);
  await loadEventFor(req, userId === user.id ? 'view' : 'manage');
  await removeMember(id, userId, role, user);
  res.status(204).end();
});

/** The invitee's landing page reads this whether or not they are signed in. */
eventPeopleRouter.get('/invitations/:token', invitationPreviewLimiter, async (req, res) => {
  const { token } = parseParams(req, InvitationTokenSchema);
  res.json({ invitation: await previewInvitation(token) });
});

eventPeopleRouter.post('/invitations/:token/accept', invitationAcceptLimiter, requireUser, async (req, res) => {
  const { token } = parseParams(req, InvitationTokenSchema);
  const user = currentUser(req);
  authorize(mayTakePartInShows(user), user, 'Confirm your e-mail address before taking a role in a show.');
  const membership = await acceptInvitation(token, user);
  res.json(presentMembership(membership));
});
