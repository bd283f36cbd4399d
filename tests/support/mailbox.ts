import { Op } from 'sequelize';
import { CaughtMail } from '@server/models/caught-mail';

/** Waits for the test mail catcher to have a message for this address (mail goes through the job queue, then SMTP). */
export async function waitForMail(to: string, timeoutMs = 60_000): Promise<CaughtMail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const mail = await CaughtMail.findOne({ where: { to: { [Op.iLike]: `%${to}%` } }, order: [['id', 'DESC']] });
    if (mail) return mail;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`No mail for ${to} within ${timeoutMs} ms`);
}

export const countMail = (to: string) => CaughtMail.count({ where: { to: { [Op.iLike]: `%${to}%` } } });

/** Waits for a mail to this address whose subject or text matches: notices of one person arrive in any order. */
export async function waitForMailAbout(to: string, about: RegExp, timeoutMs = 60_000): Promise<CaughtMail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const mails = await CaughtMail.findAll({ where: { to: { [Op.iLike]: `%${to}%` } }, order: [['id', 'DESC']] });
    const found = mails.find((m) => about.test(m.subject) || about.test(m.text));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`No mail for ${to} matching ${about} within ${timeoutMs} ms`);
}
