import { notice } from './notice';

/** The entry fee arrived: the entry is confirmed. */
export function paymentConfirmedEmail(p: { name: string; showName: string; buildTitle: string; number: number | null; amount: string; link: string }) {
  return notice({
    subject: `Payment received: ${p.showName}`,
    greeting: `Hello ${p.name},`,
    paragraphs: [`We received ${p.amount} for ${p.buildTitle} in ${p.showName}.`, `Your entry${p.number ? ` number ${p.number}` : ''} is confirmed.`],
    link: { label: 'See your entries and print your card', url: p.link },
  });
}
