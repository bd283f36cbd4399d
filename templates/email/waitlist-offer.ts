import { notice } from './notice';

/** A place freed up: the first in line has until the deadline to take it. */
export function waitlistOfferEmail(p: { name: string; showName: string; buildTitle: string; className: string; deadline: string; link: string }) {
  return notice({
    subject: `A place is free for you: ${p.showName}`,
    greeting: `Hello ${p.name},`,
    paragraphs: [
      `A place has freed up in ${p.showName}, class ${p.className}, for ${p.buildTitle}.`,
      `Take it by ${p.deadline}. After that it is offered to the next on the waiting list.`,
    ],
    link: { label: 'Take the place', url: p.link },
  });
}
