/** The password-reset e-mail: words only, the link and its lifetime come from the caller. */
export function passwordResetEmail(params: { name: string; link: string; minutes: number }) {
  const { name, link, minutes } = params;
  const text = [
    `Hello ${name},`,
    '',
    'Someone (hopefully you) asked to reset the password of your Placard account.',
    `Open this link within ${minutes} minutes to choose a new one. It works once.`,
    '',
    link,
    '',
    'If you did not ask for this, ignore this e-mail: your password stays as it is.',
    '',
    '— Placard',
  ].join('\n');
  const esc = (s: string) => s.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]!);
  const html = `<p>Hello ${esc(name)},</p>
<p>Someone (hopefully you) asked to reset the password of your Placard account.
Open this link within ${minutes} minutes to choose a new one. It works once.</p>
<p><a href="${esc(link)}">Choose a new password</a></p>
<p>If you did not ask for this, ignore this e-mail: your password stays as it is.</p>
<p>— Placard</p>`;
  return { subject: 'Reset your Placard password', text, html };
}
