import type { CaughtMail as CaughtMailBody, CaughtMailSummary } from '@shared/schemas/mail';
import type { CaughtMail } from '../models/caught-mail';

export const presentCaughtMailSummary = (m: CaughtMail): CaughtMailSummary => ({
  id: m.id,
  to: m.to,
  subject: m.subject,
  receivedAt: m.createdAt.toISOString(),
});

export const presentCaughtMail = (m: CaughtMail): CaughtMailBody => ({
  ...presentCaughtMailSummary(m),
  from: m.from,
  text: m.text,
  html: m.html,
});
