import { notice } from './notice';

/** An entry was withdrawn, by its owner or an organiser; says what refund is due by the show's rule. */
export function entryWithdrawnEmail(p: { name: string; showName: string; buildTitle: string; byOrganiser: boolean; refund: string | null }) {
  return notice({
    subject: `Entry withdrawn: ${p.showName}`,
    greeting: `Hello ${p.name},`,
    paragraphs: [
      `${p.buildTitle} is no longer entered in ${p.showName}${p.byOrganiser ? ': the organiser withdrew the entry' : ''}.`,
      p.refund ? `By the show's refund rule you get ${p.refund} back.` : 'No refund is due by the show’s refund rule.',
    ],
  });
}
