import { Op } from 'sequelize';
import { CaughtMail } from '@server/models/caught-mail';

// A committed mail job wakes the run's mail worker at once (LISTEN/NOTIFY), so a mail is caught within
// milliseconds: look often, and give up after the project's poll limit.
const POLL_MS = 25;
const MAIL_WAIT_MS = 10_000;

/** Waits for the test mail catcher to have a message for this address (mail goes through the job queue, then SMTP). */
export async function waitForMail(to: string, timeoutMs = MAIL_WAIT_MS): Promise<CaughtMail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const mail = await CaughtMail.findOne({ where: { to: { [Op.iLike]: `%${to}%` } }, order: [['id', 'DESC']] });
    if (mail) return mail;
    await new Promise((r) => setTimeout(r, POLL_MS));
  }
  throw new Error(`No mail for ${to} within ${timeoutMs} ms`);
}

export const countMail = (to: string) => CaughtMail.count({ where: { to: { [Op.iLike]: `%${to}%` } } });

/** Waits for a mail to this address whose subject or text matches: notices of one person arrive in any order. */
export async function waitForMailAbout(to: string, about: RegExp, timeoutMs = MAIL_WAIT_MS): Promise<CaughtMail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const mails = await CaughtMail.findAll({ where: { to: { [Op.iLike]: `%${to}%` } }, order: [['id', 'DESC']] });
    const found = mails.find((m) => about.test(m.subject) || about.test(m.text));
    if (found) return found;
    await new Promise((r) => setTimeout(r, POLL_MS));
  }
  throw new Error(`No mail for ${to} matching ${about} within ${timeoutMs} ms`);
}
