import type { Transaction } from 'sequelize';
import { AuditLine } from '../../models/audit-line';
import { User } from '../../models/user';

/** One audit line (who, when, before → after), written in the caller's transaction so it exists exactly when the change does. */
export async function writeAudit(
  line: { eventId: number; entryId?: number | null; actorId: number | null; action: string; before?: unknown; after?: unknown },
  transaction: Transaction,
): Promise<void> {
  await AuditLine.create({ eventId: line.eventId, entryId: line.entryId ?? null, actorId: line.actorId, action: line.action, before: line.before ?? null, after: line.after ?? null }, { transaction });
}

/** The show's trail, newest first (optionally one entry's). */
export function listAudit(eventId: number, entryId?: number, limit = 200) {
  return AuditLine.findAll({
    where: { eventId, ...(entryId ? { entryId } : {}) },
    include: [{ model: User, as: 'actor', attributes: ['id', 'name'] }],
    order: [['id', 'DESC']],
    limit,
  });
}

/** The note an organiser gave when marking each entry paid by hand ("Cash at the gate."), by entry id. */
export async function manualPaymentNotes(eventId: number): Promise<Map<number, string>> {
  const lines = await AuditLine.findAll({ where: { eventId, action: 'marked_paid' }, attributes: ['entryId', 'after'], order: [['id', 'ASC']] });
  const notes = new Map<number, string>();
  for (const l of lines) {
    const note = (l.after as { note?: unknown } | null)?.note;
    if (l.entryId !== null && typeof note === 'string') notes.set(l.entryId, note);
  }
  return notes;
}
