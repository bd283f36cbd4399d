import { describe, expect, it } from 'vitest';
import { apiClient } from '../../support/api-client';
import { createUser, uniqueEmail } from '../../support/factories';
import { countMail, waitForMail } from '../../support/mailbox';
import { PasswordResetToken } from '@server/models/password-reset-token';

const tokenFrom = (text: string) => /reset-password\?token=([A-Za-z0-9_-]+)/.exec(text)?.[1];

describe('password reset by e-mail', () => {
  it('mails a single-use link that sets a new password and ends every session', async () => {
    const { user, email, password } = await createUser({ name: 'Lou Ambrose' });
    const signedIn = await apiClient();
    await signedIn.signIn(email, password);

    const client = await apiClient();
    const res = await client.post('/api/password-resets', { email: email.toUpperCase() });
    expect(res.status).toBe(202);

    const mail = await waitForMail(email);
    expect(mail.subject).toBe('Reset your Placard password');
    expect(mail.text).toContain('Hello Lou Ambrose');
    const token = tokenFrom(mail.text);
    expect(token).toBeDefined();
    expect(mail.text).toContain(`http://127.0.0.1:3999/reset-password?token=${token}`);
    // Only a hash of the token is stored.
    const stored = await PasswordResetToken.findOne({ where: { userId: user.id } });
    expect(stored?.tokenHash).not.toContain(token!);

    const confirm = await client.post('/api/password-resets/confirm', { token, password: 'freshly chosen password' });
    expect(confirm.status).toBe(204);
    expect((await signedIn.get('/api/session')).body.user).toBeNull();
    expect((await client.signIn(email, password)).status).toBe(401);
    expect((await client.signIn(email, 'freshly chosen password')).status).toBe(200);

    const reuse = await (await apiClient()).post('/api/password-resets/confirm', { token, password: 'yet another password' });
    expect(reuse.status).toBe(400);
    expect(reuse.body.error.fields.token).toBeDefined();
  });

  it('answers the same for an unknown e-mail and sends nothing', async () => {
    const email = uniqueEmail('ghost');
    const client = await apiClient();
    const res = await client.post('/api/password-resets', { email });
    expect(res.status).toBe(202);
    // The control: a known address asked right after. Its mail arriving shows that the unknown one's
    // work (begun first, and shorter) is over, and that a mail it queued would have been sent before it.
    const control = await createUser();
    const known = await client.post('/api/password-resets', { email: control.email });
    expect(known.body).toEqual(res.body);
    await waitForMail(control.email);
    expect(await countMail(email)).toBe(0);
  });

  it('refuses an expired link', async () => {
    const { user, email } = await createUser();
    const client = await apiClient();
    await client.post('/api/password-resets', { email });
    const token = tokenFrom((await waitForMail(email)).text)!;
    // An hour and a second later, as far as the link is concerned.
    await PasswordResetToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: user.id } });
    const res = await client.post('/api/password-resets/confirm', { token, password: 'too late for this one' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/expired or was already used/);
  });

  it('validates the request and the new password', async () => {
    const client = await apiClient();
    const bad = await client.post('/api/password-resets', { email: 'nope' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.email).toBeDefined();
    const weak = await client.post('/api/password-resets/confirm', { token: 'x'.repeat(43), password: 'short' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.fields.password).toMatch(/at least/);
  });
});
