import { Op } from 'sequelize';
import { CaughtMail } from '@server/models/caught-mail';

/** Waits for the test mail catcher to have a message for this address (SMTP is asynchronous). */
export async function waitForMail(to: string, timeoutMs = 5000): Promise<CaughtMail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const mail = await CaughtMail.findOne({ where: { to: { [Op.iLike]: `%${to}%` } }, order: [['id', 'DESC']] });
    if (mail) return mail;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`No mail for ${to} within ${timeoutMs} ms`);
}

export const countMail = (to: string) => CaughtMail.count({ where: { to: { [Op.iLike]: `%${to}%` } } });
