import nodemailer, { type Transporter } from 'nodemailer';
import type SMTPTransport from 'nodemailer/lib/smtp-transport';
import { config } from '../config';

export type OutgoingMail = {
  to: string;
  subject: string;
  text: string;
  html?: string;
  /** Files sent with the mail, e.g. the entrant's card as a PDF. */
  attachments?: ReadonlyArray<{ filename: string; contentType: string; content: Buffer }>;
  /** Given once when the notice is queued and kept across every retry: one notice, one message. */
  messageId?: string;
};

export type MailSender = (mail: OutgoingMail) => Promise<void>;

/**
 * A sender to one SMTP server. Only the queue's worker sends: everything else calls queueMail().
 * Timeouts stay well under the job's expiry, so a hung server fails the attempt instead of letting
 * the queue start a second one beside it.
 */
export function createMailSender(smtpUrl: string, from = config.mailFrom): MailSender {
  // The local catcher speaks plain SMTP on loopback; a real server negotiates TLS as its URL says.
  const loopback = /^smtp:\/\/(127\.0\.0\.1|localhost)[:/]/.test(smtpUrl);
  const options: SMTPTransport.Options & { url: string } = {
    url: smtpUrl,
    ignoreTLS: loopback,
    connectionTimeout: 20_000,
    greetingTimeout: 20_000,
    socketTimeout: 60_000,
  };
  let transport: Transporter | undefined;
  return async (mail) => {
    transport ??= nodemailer.createTransport(options);
    await transport.sendMail({ from, ...mail, attachments: mail.attachments?.map((a) => ({ ...a })) });
  };
}
