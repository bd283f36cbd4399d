import type { EventRole } from '@shared/constants';
import type { AuditLine as AuditLineOut, Entry as EntryOut, MyEntry, OrganiserEntry } from '@shared/schemas/entry';
import type { Criterion as CriterionOut, EventClass as ClassOut } from '@shared/schemas/show-classes';
import type { EventDetail, EventLogoOut, EventSummary } from '@shared/schemas/show';
import type { Invitation, Member } from '@shared/schemas/show-people';
import { config } from '../config';
import type { Actor } from '../policies/actor';
import { eventAbilities } from '../policies/event';
import type { Event, EventLogo } from '../models/event';
import { mediaUrl, photoVariantKey } from '../storage/keys';
import type { EventClass } from '../models/event-class';
import type { Criterion } from '../models/criterion';
import type { Entry } from '../models/entry';
import type { EventMembership } from '../models/event-membership';
import type { EventInvitation } from '../models/event-invitation';
import type { AuditLine } from '../models/audit-line';

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);
export const eventPublicUrl = (slug: string) => `${config.publicBaseUrl}/e/${slug}`;

export const presentClass = (c: EventClass): ClassOut => ({ id: c.id, name: c.name, description: c.description, position: c.position, capacity: c.capacity });
export const presentCriterion = (c: Criterion): CriterionOut => ({ id: c.id, name: c.name, maxPoints: c.maxPoints, weight: Number(c.weight), tieBreakOrder: c.tieBreakOrder, position: c.position });

export function presentEventSummary(e: Event, myRoles: EventRole[] = []): EventSummary {
  return {
    id: e.id,
    name: e.name,
    slug: e.slug,
    status: e.status,
    venueName: e.venueName,
    timeZone: e.timeZone,
    startsAt: e.startsAt.toISOString(),
    endsAt: e.endsAt.toISOString(),
    registrationOpensAt: e.registrationOpensAt.toISOString(),
    registrationClosesAt: e.registrationClosesAt.toISOString(),
    entryFee: e.entryFee,
    currency: e.currency,
    asksFor: [...e.asksFor],
    myRoles,
    publicUrl: eventPublicUrl(e.slug),
    logo: presentEventLogo(e.logo),
  };
}

/** The widest stored logo that is at most 320 px (crisp at 160 CSS px on a phone), else the narrowest. */
export function presentEventLogo(logo: EventLogo | null | undefined): EventLogoOut | null {
  if (!logo || logo.variants.length === 0) return null;
  const sorted = [...logo.variants].sort((a, b) => a.width - b.width);
  const v = [...sorted].reverse().find((x) => x.width <= 320) ?? sorted[0]!;
  return { webp: mediaUrl(photoVariantKey(logo.storageKey, v.width, 'webp')), jpeg: mediaUrl(photoVariantKey(logo.storageKey, v.width, 'jpg')), width: v.width, height: v.height };
}

/** Everything about a show for the people who run it (the event's own settings carry no one's private data). */
export function presentEvent(e: Event, actor: Actor | null): EventDetail {
  const myRoles = (actor?.memberships ?? []).filter((m) => m.eventId === e.id).map((m) => m.role);
  return {
    ...presentEventSummary(e, myRoles),
    venueAddress: e.venueAddress,
    capacity: e.capacity,
    refundRule: { fullRefundUntil: e.refundRule.fullRefundUntil, afterwardsPercent: e.refundRule.afterwardsPercent },
    description: e.description,
    classes: (e.classes ?? []).map(presentClass),
    criteria: (e.criteria ?? []).map(presentCriterion),
    abilities: eventAbilities(actor, e),
  };
}

export function presentEntry(e: Entry, positions: Map<number, number>): EntryOut {
  return {
    id: e.id,
    eventId: e.eventId,
    buildId: e.buildId,
    buildTitle: e.build?.title ?? '',
    buildCode: e.build?.code ?? '',
    classId: e.classId,
    className: e.eventClass?.name ?? '',
    number: e.number,
    status: e.status,
    feeAmount: e.feeAmount,
    currency: e.currency,
    paymentRef: e.paymentRef,
    paidAt: iso(e.paidAt),
    refundDue: e.refundDue,
    refundedAt: iso(e.refundedAt),
    offerExpiresAt: e.status === 'waiting_list' ? iso(e.offerExpiresAt) : null,
    waitingPosition: positions.get(e.id) ?? null,
    createdAt: e.createdAt.toISOString(),
  };
}

export const presentOrganiserEntry = (e: Entry, positions: Map<number, number>): OrganiserEntry => ({ ...presentEntry(e, positions), ownerName: e.owner?.name ?? '' });
export const presentMyEntry = (e: Entry, positions: Map<number, number>): MyEntry => ({ ...presentEntry(e, positions), event: presentEventSummary(e.event!) });

/** Members are shown to the show's organisers only, so the e-mail is there to reach them. */
export const presentMember = (m: EventMembership): Member => ({ userId: m.userId, name: m.user?.name ?? '', email: m.user?.email ?? '', role: m.role });
export const presentInvitation = (i: EventInvitation): Invitation => ({ id: i.id, email: i.email, role: i.role, expiresAt: i.expiresAt.toISOString(), invitedBy: i.inviter?.name ?? '' });
export const presentAuditLine = (a: AuditLine): AuditLineOut => ({ id: a.id, at: a.createdAt.toISOString(), who: a.actor?.name ?? null, action: a.action, entryId: a.entryId, before: a.before, after: a.after });

/** What the withdrawing person learns: the entry's new state and any refund due. */
export const presentWithdrawal = (e: Pick<Entry, 'id' | 'status' | 'refundDue' | 'currency'>): { id: number; status: Entry['status']; refundDue: number | null; currency: string } => ({ id: e.id, status: e.status, refundDue: e.refundDue, currency: e.currency });

export const presentMembership = (m: { eventId: number; role: EventRole }) => ({ eventId: m.eventId, role: m.role });
