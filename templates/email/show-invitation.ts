import { notice } from './notice';

/** An invitation to take a role in a show: the link works once, until it expires. */
export function showInvitationEmail(p: { showName: string; roleLabel: string; inviterName: string; link: string; days: number }) {
  return notice({
    subject: `You are invited to ${p.showName} as ${p.roleLabel.toLowerCase()}`,
    greeting: 'Hello,',
    paragraphs: [
      `${p.inviterName} invites you to help run ${p.showName} on Placard, as ${p.roleLabel.toLowerCase()}.`,
      `The link works once and for ${p.days} days. Sign in or create an account to accept.`,
    ],
    link: { label: 'Accept the invitation', url: p.link },
    after: ['If you were not expecting this, ignore this e-mail.'],
  });
}
