import { notice } from './notice';

/** To a show's organisers: a payment reached an entry but did not simply pay its fee. */
export function paymentNeedsAttentionEmail(p: { showName: string; number: number | null; buildTitle: string; what: string; amount: string; fee: string; refunded: boolean; link: string }) {
  const entry = `${p.number ? `entry ${p.number}` : 'an entry'} (${p.buildTitle})`;
  return notice({
    subject: `A payment needs your attention: ${p.showName}`,
    greeting: 'Hello,',
    paragraphs: [
      `The payment service took ${p.amount} for ${entry} in ${p.showName}; the fee is ${p.fee}.`,
      `${p.what}.`,
      p.refunded
        ? 'The entry was already paid, so this payment is being refunded in full automatically. Nothing else changed.'
        : 'The entry was left as it was. Look at it in the entries table and settle it with the entrant.',
    ],
    link: { label: 'Open the entries table', url: p.link },
  });
}
