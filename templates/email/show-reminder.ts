import { notice } from './notice';

/** Days before a show: where and when, the entry's number and class, and the card attached to print. */
export function showReminderEmail(p: { name: string; showName: string; when: string; venue: string; buildTitle: string; className: string; number: number; link: string }) {
  return notice({
    subject: `See you at ${p.showName}: your card for entry ${p.number}`,
    greeting: `Hello ${p.name},`,
    paragraphs: [
      `${p.showName} starts ${p.when} at ${p.venue}.`,
      `${p.buildTitle} is entry number ${p.number} in the class ${p.className}. Your windshield card with that number is attached: print it and put it behind the windshield, where the gate can scan its QR code.`,
    ],
    link: { label: 'See your entries', url: p.link },
  });
}
