import { ActionLink, renderEmailHtml } from './layout';

/** Sent after sign-up (and on request): the link that confirms the address. */
export function verifyEmail(params: { name: string; link: string; hours: number }) {
  const { name, link, hours } = params;
  const text = [
    `Hello ${name},`,
    '',
    'Welcome to Placard. Open this link to confirm that this e-mail address is yours:',
    '',
    link,
    '',
    `It works once, within ${hours} hours. Opened in the browser you signed up in, it signs you in too. You can sign in and build before confirming; entering shows and joining a show's team need a confirmed address.`,
    '',
    'If you did not make a Placard account, ignore this e-mail: nothing happens without the link.',
    '',
    '— Placard',
  ].join('\n');
  const html = renderEmailHtml(
    <>
      <p>Hello {name},</p>
      <p>Welcome to Placard. Confirm that this e-mail address is yours:</p>
      <ActionLink href={link}>Confirm my address</ActionLink>
      <p>
        It works once, within {hours} hours. Opened in the browser you signed up in, it signs you in too. You can sign in and build before
        confirming; entering shows and joining a show&apos;s team need a confirmed address.
      </p>
      <p>If you did not make a Placard account, ignore this e-mail: nothing happens without the link.</p>
    </>,
  );
  return { subject: 'Confirm your e-mail address for Placard', text, html };
}
