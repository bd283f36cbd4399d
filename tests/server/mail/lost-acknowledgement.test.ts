import { afterAll, describe, expect, it, vi } from 'vitest';
import '@server/models/index';
import { randomBytes } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { sequelize } from '@server/db/sequelize';
import { config } from '@server/config';
import { JobQueue, MAIL_QUEUE } from '@server/jobs/queue';
import { startMailWorker } from '@server/jobs/send-mail';
import { createMailSender } from '@server/mail/mailer';
import { enqueueMail } from '@server/mail/outbox';
import { uniqueEmail } from '../../support/factories';
import { SmtpTrap } from '../../support/smtp-trap';

const LOST_ACK_WAIT_SECONDS = 3; // well above the plain retry's 1 s, so a quick retry would show

describe('a mail server that answers 421 after the message (the acknowledgement is lost)', () => {
  const schema = `pgboss_t${randomBytes(4).toString('hex')}`;
  const queue = new JobQueue({ connectionString: config.databaseUrl, schema, applicationName: `placard-test-${schema}`, supervise: false, pollSeconds: 0.5, mailRetryDelaySeconds: 1, mailRetryLimit: 5, mailLostAckRetrySeconds: LOST_ACK_WAIT_SECONDS });
  const trap = new SmtpTrap().answerAfterMessage(421, 1);

  afterAll(async () => {
    await queue.stop();
    await trap.stop();
    await sequelize.query(`DROP SCHEMA IF EXISTS ${schema} CASCADE`);
  });

  it('keeps one Message-ID per notice across the retry, and sends again only after the backed-off wait', async () => {
    await trap.start();
    const addresses = Array.from({ length: 5 }, (_, i) => uniqueEmail(`lost-ack-${i}`));
    for (const to of addresses) await enqueueMail(queue, { to, subject: 'Payment received', text: `for ${to}` });
    await startMailWorker(queue, createMailSender(trap.url));

    // Each notice arrives, is answered 421, and arrives once more after the wait (the trap then answers 250).
    await vi.waitFor(() => expect(trap.received).toHaveLength(10), { timeout: 30_000, interval: 100 });
    const ids = new Set<string>();
    for (const to of addresses) {
      const copies = trap.to(to);
      expect(copies).toHaveLength(2);
      expect(copies[0]!.messageId).toMatch(/^<[0-9a-f-]{36}@.+>$/);
      expect(copies[1]!.messageId).toBe(copies[0]!.messageId);
      ids.add(copies[0]!.messageId!);
      const [first, second] = copies.map((m) => trap.arrivedAt[trap.received.indexOf(m)]!);
      expect(second! - first!).toBeGreaterThanOrEqual(LOST_ACK_WAIT_SECONDS * 1000 - 250);
    }
    expect(ids.size).toBe(5); // five notices, five messages

    // Nothing is left to send: no third copy can come.
    await vi.waitFor(async () => {
      const states = await sequelize.query<{ state: string }>(`SELECT state FROM ${schema}.job WHERE name = $1`, { bind: [MAIL_QUEUE], type: QueryTypes.SELECT });
      expect(states.map((s) => s.state).filter((s) => s !== 'completed')).toEqual([]);
    }, { timeout: 10_000, interval: 100 });
    expect(trap.received).toHaveLength(10);
  });
});
