import { describe, expect, it } from 'vitest';
import { Op } from 'sequelize';
import { CaughtMail } from '@server/models/caught-mail';
import { EmailVerificationToken } from '@server/models/email-verification-token';
import { User } from '@server/models/user';
import { EmailVerificationConfirmResponseSchema, SignUpResponseSchema } from '@shared/schemas/user';
import { EMAIL_VERIFICATION_RESENDS_PER_HOUR } from '@shared/constants';
import { apiClient } from '../../support/api-client';
import { createUser, DEFAULT_PASSWORD, uniqueEmail } from '../../support/factories';
import { countMail, waitForMail } from '../../support/mailbox';

const PASSWORD = 'long enough password';
const tokenIn = (mail: CaughtMail) => /\/verify-email\?token=([A-Za-z0-9_-]+)/.exec(mail.text)![1]!;
const mailsTo = (to: string) => CaughtMail.findAll({ where: { to: { [Op.iLike]: `%${to}%` } }, order: [['id', 'ASC']] });

async function signUpAndGetToken(label: string) {
  const email = uniqueEmail(label);
  const client = await apiClient();
  expect((await client.post('/api/users', { email, name: 'Kit Ansel', password: PASSWORD })).status).toBe(202);
  const mail = await waitForMail(email);
  return { email, client, mail, token: tokenIn(mail) };
}

describe('sign-up and e-mail verification', () => {
  it('answers a new address and one that already has an account exactly alike, and mails each what fits', async () => {
    const known = await createUser({ name: 'Known Owner' });
    const fresh = uniqueEmail('fresh');
    const first = await apiClient();
    const second = await apiClient();
    const forNew = await first.post('/api/users', { email: fresh, name: 'New Person', password: PASSWORD });
    const forKnown = await second.post('/api/users', { email: known.email, name: 'Someone Else', password: 'another long password' });

    expect(forNew.status).toBe(202);
    expect(forKnown.status).toBe(forNew.status);
    expect(forKnown.body).toEqual(forNew.body);
    expect(SignUpResponseSchema.parse(forNew.body).message).toMatch(/Check your inbox/);
    expect(Object.keys(forKnown.headers).sort()).toEqual(Object.keys(forNew.headers).sort());
    for (const client of [first, second]) expect((await client.get('/api/session')).body.user).toBeNull();

    const welcome = await waitForMail(fresh);
    expect(welcome.subject).toBe('Confirm your e-mail address for Placard');
    expect(welcome.text).toContain('http://127.0.0.1:3999/verify-email?token=');
    const existing = await waitForMail(known.email);
    expect(existing.subject).toBe('You already have a Placard account');
    expect(existing.text).toContain('http://127.0.0.1:3999/sign-in');
    expect(existing.text).not.toContain('verify-email');

    // The existing account is untouched: same name, same password.
    await known.user.reload();
    expect(known.user.name).toBe('Known Owner');
    expect((await (await apiClient()).signIn(known.email, DEFAULT_PASSWORD)).status).toBe(200);
    expect(await User.count({ where: { email: known.email } })).toBe(1);
  });

  it('sends the "already have an account" mail at most once an hour, so sign-up cannot flood an inbox', async () => {
    const known = await createUser();
    for (let i = 0; i < 3; i++) expect((await (await apiClient()).post('/api/users', { email: known.email, name: 'Pest', password: PASSWORD })).status).toBe(202);
    const marker = await signUpAndGetToken('flood-marker'); // queued after the three, sent by the same worker
    expect(marker.mail).toBeDefined();
    expect(await countMail(known.email)).toBe(1);
  });

  it('keeps a new account unconfirmed until its link is followed, then confirms it; a second click is harmless', async () => {
    const { email, client, token } = await signUpAndGetToken('confirm');
    expect((await client.signIn(email, PASSWORD)).body.user.emailVerified).toBe(false);
    expect((await User.findOne({ where: { email } }))!.emailVerified).toBe(false);

    const res = await client.post('/api/email-verifications/confirm', { token });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ verified: true, session: null }); // signed in already: nothing changes
    expect((await client.get('/api/session')).body.user.emailVerified).toBe(true);
    const user = (await User.findOne({ where: { email } }))!;
    expect(user.emailVerifiedAt).toBeInstanceOf(Date);
    expect(user.emailVerified).toBe(true);

    // The link works without a session too (opened on another device), and again after use.
    expect((await (await apiClient()).post('/api/email-verifications/confirm', { token })).status).toBe(200);
  });

  it('signs the new account in when its link is confirmed in the browser that signed up, and only there', async () => {
    const { email, client, token } = await signUpAndGetToken('same-browser');
    const res = await client.post('/api/email-verifications/confirm', { token });
    expect(res.status).toBe(200);
    const body = EmailVerificationConfirmResponseSchema.parse(res.body);
    expect(body.session?.user).toMatchObject({ email, name: 'Kit Ansel', emailVerified: true });
    const now = await client.refresh();
    expect(now.body.user).toMatchObject({ email, emailVerified: true });
    // The answer carries the new session's CSRF token, and it works for the next write.
    expect(now.body.csrfToken).toBe(body.session!.csrfToken);
    const renamed = await client.patch('/api/account', { name: 'Kit Ansel-Rowe' });
    expect(renamed.body).toMatchObject({ user: { name: 'Kit Ansel-Rowe' } });

    // Another browser (or the same one after signing up as someone else) only confirms.
    const second = await signUpAndGetToken('other-browser');
    const stranger = await apiClient();
    const elsewhere = await stranger.post('/api/email-verifications/confirm', { token: second.token });
    expect(elsewhere.body).toEqual({ verified: true, session: null });
    expect((await stranger.get('/api/session')).body.user).toBeNull();
    expect((await User.findOne({ where: { email: second.email } }))!.emailVerified).toBe(true);

    // A disabled account is not signed in by its link, even in its own browser.
    const third = await signUpAndGetToken('disabled-then-confirmed');
    await User.update({ disabledAt: new Date() }, { where: { email: third.email } });
    expect((await third.client.post('/api/email-verifications/confirm', { token: third.token })).body.session ?? null).toBeNull();
    expect((await third.client.get('/api/session')).body.user).toBeNull();
  });

  it('refuses an expired link and a made-up one with a 400 naming the token, and confirms nothing', async () => {
    const { email, token } = await signUpAndGetToken('expired');
    const user = (await User.findOne({ where: { email } }))!;
    await EmailVerificationToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: user.id } });
    const client = await apiClient();
    for (const t of [token, 'z'.repeat(43)]) {
      const res = await client.post('/api/email-verifications/confirm', { token: t });
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('VALIDATION_FAILED');
      expect(res.body.error.fields.token).toBe('Expired or already used.');
    }
    const malformed = await client.post('/api/email-verifications/confirm', { token: 'not a token!' });
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.fields.token).toBe('The confirmation link is not valid.');
    await user.reload();
    expect(user.emailVerifiedAt).toBeNull();
  });

  it('spends every earlier link once the address is confirmed with a newer one', async () => {
    const { email, client, token: first } = await signUpAndGetToken('two-links');
    await client.signIn(email, PASSWORD);
    expect((await client.post('/api/account/email-verification')).status).toBe(202);
    await expect.poll(() => countMail(email)).toBe(2);
    const second = tokenIn((await mailsTo(email))[1]!);
    expect(second).not.toBe(first);
    expect((await client.post('/api/email-verifications/confirm', { token: second })).status).toBe(200);
    const user = (await User.findOne({ where: { email } }))!;
    expect(await EmailVerificationToken.count({ where: { userId: user.id, usedAt: null } })).toBe(0);
  });

  it('resends a link to the signed-in, unconfirmed person a few times an hour, and to nobody else', async () => {
    const anonymous = await apiClient();
    expect((await anonymous.post('/api/account/email-verification')).status).toBe(401);

    const verified = await createUser();
    const client = await apiClient();
    await client.signIn(verified.email, verified.password);
    const already = await client.post('/api/account/email-verification');
    expect(already.status).toBe(409);
    expect(already.body.error.message).toBe('Your e-mail address is already confirmed.');

    const pending = await createUser({ emailVerified: false });
    const own = await apiClient();
    await own.signIn(pending.email, pending.password);
    expect((await own.get('/api/session')).body.user.emailVerified).toBe(false);
    for (let i = 0; i < EMAIL_VERIFICATION_RESENDS_PER_HOUR; i++) expect((await own.post('/api/account/email-verification')).status).toBe(202);
    const limited = await own.post('/api/account/email-verification');
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe('RATE_LIMITED');
    await expect.poll(() => countMail(pending.email)).toBe(EMAIL_VERIFICATION_RESENDS_PER_HOUR);
    expect((await mailsTo(pending.email)).every((m) => m.subject === 'Confirm your e-mail address for Placard')).toBe(true);
  });
});
