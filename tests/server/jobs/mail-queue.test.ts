import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import '@server/models/index';
import { randomBytes } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { sequelize } from '@server/db/sequelize';
import { config } from '@server/config';
import { logger } from '@server/logger';
import { JobQueue, MAIL_QUEUE } from '@server/jobs/queue';
import { startMailWorker } from '@server/jobs/send-mail';
import { createMailSender } from '@server/mail/mailer';
import { enqueueMail, queueMail } from '@server/mail/outbox';
import { countMail, waitForMail } from '../../support/mailbox';
import { createUser, uniqueEmail } from '../../support/factories';
import { apiClient } from '../../support/api-client';
import { listUndeliveredMail } from '@server/services/accounts/undelivered-mail';
import { SmtpTrap } from '../../support/smtp-trap';

type JobRow = { state: string; retry_count: number; to: string };
const jobsTo = (schema: string, addresses: string[]) =>
  sequelize.query<JobRow>(`SELECT state, retry_count, data->>'to' AS "to" FROM ${schema}.job WHERE name = $1 AND data->>'to' = ANY($2)`, {
    bind: [MAIL_QUEUE, addresses],
    type: QueryTypes.SELECT,
  });

describe('queueMail() through the job queue (the run-wide worker and catcher)', () => {
  it('queues inside the caller’s transaction: nothing exists before the commit, the mail arrives after it', async () => {
    const to = uniqueEmail('after-commit');
    await sequelize.transaction(async (transaction) => {
      await queueMail({ to, subject: 'Sent after the commit', text: 'hello' }, { transaction });
      expect(await jobsTo('pgboss', [to])).toEqual([]); // another connection sees no job yet
    });
    expect((await waitForMail(to)).subject).toBe('Sent after the commit');
  });

  it('sends nothing when the caller’s transaction rolls back', async () => {
    const to = uniqueEmail('rolled-back');
    await expect(
      sequelize.transaction(async (transaction) => {
        await queueMail({ to, subject: 'Never', text: 'never' }, { transaction });
        throw new Error('the caller’s write failed');
      }),
    ).rejects.toThrow('the caller’s write failed');
    const marker = uniqueEmail('marker');
    await queueMail({ to: marker, subject: 'Marker', text: 'after the rollback' });
    await waitForMail(marker);
    expect(await jobsTo('pgboss', [to])).toEqual([]);
    expect(await countMail(to)).toBe(0);
  });

  it('sends one mail for one dedupe key, however often and however concurrently it is queued', async () => {
    const to = uniqueEmail('dedupe');
    const key = `test-dedupe-${to}`;
    const results = await Promise.all(Array.from({ length: 5 }, () => queueMail({ to, subject: 'Once', text: 'once' }, { dedupeKey: key })));
    expect(results.filter(Boolean)).toHaveLength(1);
    expect(await queueMail({ to, subject: 'Once', text: 'later' }, { dedupeKey: key })).toBe(false);
    await waitForMail(to);
    await vi.waitFor(async () => expect((await jobsTo('pgboss', [to])).map((j) => j.state)).toEqual(['completed']), { timeout: 10_000 });
    expect(await countMail(to)).toBe(1);
  });
});

/** A job queue in a schema of its own, quick to retry, and a mail server (trap) that this describe starts and stops. */
function queueOfItsOwn(mailRetryLimit: number) {
  const schema = `pgboss_t${randomBytes(4).toString('hex')}`;
  const queue = new JobQueue({ connectionString: config.databaseUrl, schema, applicationName: `placard-test-${schema}`, supervise: false, pollSeconds: 0.5, mailRetryDelaySeconds: 1, mailRetryLimit });
  return { schema, trap: new SmtpTrap(), queue };
}

describe('a mail server that is down', () => {
  const { schema, trap, queue } = queueOfItsOwn(10);

  beforeAll(async () => {
    await trap.start(); // to learn a free port; it goes down before anything is sent
    await trap.stop();
  });
  afterAll(async () => {
    await queue.stop();
    await trap.stop();
    await sequelize.query(`DROP SCHEMA IF EXISTS ${schema} CASCADE`);
  });

  it('delays the notices queued meanwhile and loses none: each arrives exactly once when it is back', async () => {
    const card = Buffer.concat([Buffer.from('%PDF-1.4\n'), randomBytes(30_000), Buffer.from('\n%%EOF\n')]);
    const addresses = [uniqueEmail('down-1'), uniqueEmail('down-2'), uniqueEmail('down-3')];
    await enqueueMail(queue, { to: addresses[0]!, subject: 'Registration received', text: 'one' });
    await enqueueMail(queue, { to: addresses[1]!, subject: 'Payment confirmed', text: 'two', html: '<p>two</p>' });
    await enqueueMail(queue, {
      to: addresses[2]!,
      subject: 'Your card for the show',
      text: 'three',
      attachments: [{ filename: 'card.pdf', contentType: 'application/pdf', content: card }],
    });
    await startMailWorker(queue, createMailSender(trap.url));

    // Every notice was tried against the dead server and is waiting for its next try.
    await vi.waitFor(async () => {
      const jobs = await jobsTo(schema, addresses);
      expect(jobs).toHaveLength(3);
      for (const job of jobs) expect(job.retry_count).toBeGreaterThanOrEqual(1);
    }, { timeout: 20_000, interval: 200 });
    expect(trap.received).toHaveLength(0);

    await trap.start(); // the mail server is back, on the same port

    await vi.waitFor(async () => expect((await jobsTo(schema, addresses)).map((j) => j.state)).toEqual(['completed', 'completed', 'completed']), {
      timeout: 30_000,
      interval: 200,
    });
    for (const to of addresses) expect(trap.to(to)).toHaveLength(1);
    expect(trap.received).toHaveLength(3);
    const [withCard] = trap.to(addresses[2]!);
    expect(withCard!.attachments.map((a) => [a.filename, a.contentType])).toEqual([['card.pdf', 'application/pdf']]);
    expect(Buffer.compare(withCard!.attachments[0]!.content, card)).toBe(0);
    expect(trap.to(addresses[1]!)[0]!.html).toContain('<p>two</p>');
  });

  it('lives through its database connections being cut, logs it, and sends what is queued afterwards', async () => {
    const logged = vi.spyOn(logger, 'error');
    await vi.waitFor(async () => {
      const [row] = await sequelize.query<{ n: number }>('SELECT count(*)::int AS n FROM pg_stat_activity WHERE application_name = $1', {
        bind: [`placard-test-${schema}`],
        type: QueryTypes.SELECT,
      });
      expect(row!.n).toBeGreaterThan(0);
    });
    // What a restart of PostgreSQL does to a pool: every connection is ended by the server.
    await sequelize.query('SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE application_name = $1', {
      bind: [`placard-test-${schema}`],
      type: QueryTypes.SELECT,
    });
    await vi.waitFor(() => expect(logged.mock.calls.some(([, message]) => String(message).startsWith('job queue: database error'))).toBe(true), {
      timeout: 10_000,
    });
    const to = uniqueEmail('after-cut');
    await enqueueMail(queue, { to, subject: 'Still here', text: 'the queue reconnected' });
    await vi.waitFor(() => expect(trap.to(to)).toHaveLength(1), { timeout: 15_000, interval: 200 });
    logged.mockRestore();
  });
});

describe('mail that cannot be sent', () => {
  const { schema, trap, queue } = queueOfItsOwn(1);

  beforeAll(async () => {
    await trap.start(); // to learn a free port; it stays down
    await trap.stop();
  });
  afterAll(async () => {
    await queue.stop();
    await sequelize.query(`DROP SCHEMA IF EXISTS ${schema} CASCADE`);
  });

  it('is listed for the site admin while it is retried and after the queue gives up, with the mail server’s error', async () => {
    const to = uniqueEmail('never');
    await enqueueMail(queue, { to, subject: 'Reset your Placard password', text: 'a link' });
    await startMailWorker(queue, createMailSender(trap.url));
    await vi.waitFor(async () => expect((await listUndeliveredMail(schema)).find((m) => m.to === to)?.status).toBe('retrying'), { timeout: 20_000, interval: 200 });
    const gaveUp = await vi.waitFor(
      async () => {
        const found = (await listUndeliveredMail(schema)).find((m) => m.to === to && m.status === 'gave_up');
        expect(found).toBeDefined();
        return found!;
      },
      { timeout: 30_000, interval: 200 },
    );
    expect(gaveUp.subject).toBe('Reset your Placard password');
    expect(gaveUp.lastError).toMatch(/ECONNREFUSED/);
    expect((await listUndeliveredMail(schema)).filter((m) => m.to === to)).toHaveLength(1); // listed once, not again as its dead letter
    expect(trap.received).toHaveLength(0);
  });

  it('answers the admin only', async () => {
    const admin = await createUser({ isSiteAdmin: true });
    const owner = await createUser();
    const adminClient = await apiClient();
    await adminClient.signIn(admin.email, admin.password);
    const ownerClient = await apiClient();
    await ownerClient.signIn(owner.email, owner.password);
    const seen = await adminClient.get('/api/admin/undelivered-mail');
    expect(seen.status).toBe(200);
    expect(Array.isArray(seen.body.mail)).toBe(true);
    expect((await ownerClient.get('/api/admin/undelivered-mail')).status).toBe(403);
  });
});
