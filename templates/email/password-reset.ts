/** Who asked for the link: the owner on the sign-in page, or the site admin from the Accounts page. */
export type ResetAskedBy = 'owner' | 'site-admin';

const WHY: Record<ResetAskedBy, { opening: string; ifNotAsked: string }> = {
  owner: {
    opening: 'Someone (hopefully you) asked to reset the password of your Placard account.',
    ifNotAsked: 'If you did not ask for this, ignore this e-mail: your password stays as it is.',
  },
  'site-admin': {
    opening: 'The site admin of Placard sent you this link to choose a new password for your account.',
    ifNotAsked: 'If you did not expect it, you may ignore this e-mail: your password stays as it is until you use the link.',
  },
};

/** The password-reset e-mail: words only, the link and its lifetime come from the caller. */
export function passwordResetEmail(params: { name: string; link: string; minutes: number; askedBy?: ResetAskedBy }) {
  const { name, link, minutes, askedBy = 'owner' } = params;
  const { opening, ifNotAsked } = WHY[askedBy];
  const text = [
    `Hello ${name},`,
    '',
    opening,
    `Open this link within ${minutes} minutes to choose a new one. It works once.`,
    '',
    link,
    '',
    ifNotAsked,
    '',
    '— Placard',
  ].join('\n');
  const esc = (s: string) => s.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]!);
  const html = `<p>Hello ${esc(name)},</p>
<p>${opening}
Open this link within ${minutes} minutes to choose a new one. It works once.</p>
<p><a href="${esc(link)}">Choose a new password</a></p>
<p>${ifNotAsked}</p>
<p>— Placard</p>`;
  return { subject: 'Reset your Placard password', text, html };
}
