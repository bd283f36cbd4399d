import { notice } from './notice';

/** Registration received: confirmed (free show), awaiting payment, or on the waiting list. */
export function entryReceivedEmail(p: {
  name: string;
  showName: string;
  buildTitle: string;
  className: string;
  number: number | null;
  state: 'confirmed' | 'awaiting_payment' | 'waiting_list';
  fee: string;
  link: string;
}) {
  const what =
    p.state === 'confirmed'
      ? `Your entry is confirmed: number ${p.number}.`
      : p.state === 'awaiting_payment'
        ? `Your entry has number ${p.number}. It is confirmed once the entry fee of ${p.fee} is paid.`
        : 'The class or the show is full, so your entry is on the waiting list. If a place frees, we e-mail you an offer with a deadline to take it.';
  return notice({
    subject: p.state === 'waiting_list' ? `Waiting list: ${p.showName}` : `Entry received: ${p.showName}`,
    greeting: `Hello ${p.name},`,
    paragraphs: [`We have your entry of ${p.buildTitle} in ${p.showName}, class ${p.className}.`, what],
    link: { label: 'See your entries', url: p.link },
  });
}
