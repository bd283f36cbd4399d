import { afterAll, describe, expect, it, vi } from 'vitest';
import { apiClient } from '../../support/api-client';
import { createUser } from '../../support/factories';

// Queuing the mail is held back until the test lets it go, and hashing is watched, so both the order of
// work and what an unknown token costs can be seen without timing anything.
const held = vi.hoisted(() => {
  let release!: () => void;
  const gate = new Promise<void>((r) => (release = r));
  return { gate, release, sent: [] as string[] };
});

vi.mock('@server/mail/outbox', () => ({
  queueMail: vi.fn(async (mail: { to: string }) => {
    await held.gate;
    held.sent.push(mail.to);
  }),
}));

vi.mock('@server/auth/passwords', async (importOriginal) => {
  const real = await importOriginal<typeof import('@server/auth/passwords')>();
  return { ...real, hashPassword: vi.fn(real.hashPassword) };
});

const { hashPassword } = await import('@server/auth/passwords');

afterAll(() => held.release());

const within = <T>(ms: number, p: Promise<T>) =>
  Promise.race([p, new Promise<never>((_, reject) => setTimeout(() => reject(new Error(`no answer within ${ms} ms`)), ms))]);

describe('password reset: nothing to learn from how long it takes', () => {
  it('answers a known e-mail before any mail is queued, so it takes no longer than an unknown one', async () => {
    const { email } = await createUser();
    const client = await apiClient();
    const res = await within(3000, client.post('/api/password-resets', { email }));
    expect(res.status).toBe(202);
    expect(held.sent).toEqual([]);
    held.release();
    await vi.waitFor(() => expect(held.sent).toContain(email), { timeout: 5000 });
  });

  it('spends no password hash on a token that is not live', async () => {
    vi.mocked(hashPassword).mockClear();
    const res = await (await apiClient()).post('/api/password-resets/confirm', { token: 'y'.repeat(43), password: 'long enough password' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.token).toBeDefined();
    expect(hashPassword).not.toHaveBeenCalled();
  });
});
