import { ActionLink, renderEmailHtml } from './layout';

/**
 * Sent when someone signs up with an address that already has an account. Sign-up answers the
 * same either way, so only the owner of the mailbox learns that the account exists.
 */
export function accountExistsEmail(params: { name: string; signInLink: string; resetLink: string }) {
  const { name, signInLink, resetLink } = params;
  const text = [
    `Hello ${name},`,
    '',
    'Someone (hopefully you) tried to make a new Placard account with this e-mail address, but you already have one.',
    '',
    `Sign in: ${signInLink}`,
    `Forgot the password? Choose a new one: ${resetLink}`,
    '',
    'If it was not you, ignore this e-mail: nothing changed on your account.',
    '',
    '— Placard',
  ].join('\n');
  const html = renderEmailHtml(
    <>
      <p>Hello {name},</p>
      <p>Someone (hopefully you) tried to make a new Placard account with this e-mail address, but you already have one.</p>
      <ActionLink href={signInLink}>Sign in</ActionLink>
      <p>
        Forgot the password? <a href={resetLink}>Choose a new one</a>.
      </p>
      <p>If it was not you, ignore this e-mail: nothing changed on your account.</p>
    </>,
  );
  return { subject: 'You already have a Placard account', text, html };
}
