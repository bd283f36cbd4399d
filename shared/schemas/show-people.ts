import { z } from 'zod';
import { EVENT_ROLES } from '../constants';
import { EmailSchema } from './user';

// The people who run a show with its organisers: invitations and members.

export const InvitationCreateSchema = z.object({ email: EmailSchema, role: z.enum(EVENT_ROLES, { error: 'Role must be organiser, judge or gate.' }) });
export type InvitationCreateInput = z.infer<typeof InvitationCreateSchema>;
export const InvitationTokenSchema = z.object({ token: z.string({ error: 'The invitation link is incomplete.' }).regex(/^[A-Za-z0-9_-]{20,100}$/, { error: 'The invitation link is not valid.' }) });

// ---- Responses ----
export const MemberSchema = z.object({ userId: z.number(), name: z.string(), email: z.string(), role: z.enum(EVENT_ROLES) });
export type Member = z.infer<typeof MemberSchema>;
export const InvitationSchema = z.object({ id: z.number(), email: z.string(), role: z.enum(EVENT_ROLES), expiresAt: z.string(), invitedBy: z.string() });
export type Invitation = z.infer<typeof InvitationSchema>;
export const InvitationPreviewSchema = z.object({ eventName: z.string(), eventSlug: z.string(), role: z.enum(EVENT_ROLES), expiresAt: z.string(), state: z.enum(['open', 'used', 'expired', 'revoked']) });
export type InvitationPreview = z.infer<typeof InvitationPreviewSchema>;
