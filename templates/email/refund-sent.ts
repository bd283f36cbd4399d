import { notice } from './notice';

/** The payment service has sent an entry fee back. */
export function refundSentEmail(p: { name: string; showName: string; buildTitle: string; amount: string; link: string }) {
  return notice({
    subject: `Refund sent: ${p.showName}`,
    greeting: `Hello ${p.name},`,
    paragraphs: [
      `${p.amount} of the entry fee for ${p.buildTitle} in ${p.showName} is on its way back to the card you paid with.`,
      'Banks usually show it within a few working days.',
    ],
    link: { label: 'Your entries', url: p.link },
  });
}
