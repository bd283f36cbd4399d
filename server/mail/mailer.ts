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
};

let transport: Transporter | undefined;

function getTransport(): Transporter {
  // The local catcher speaks plain SMTP on loopback; a real server negotiates TLS as its URL says.
  const loopback = /^smtp:\/\/(127\.0\.0\.1|localhost)[:/]/.test(config.smtpUrl);
  const options: SMTPTransport.Options & { url: string } = { url: config.smtpUrl, ignoreTLS: loopback };
  transport ??= nodemailer.createTransport(options);
  return transport;
}

export async function sendMail(mail: OutgoingMail): Promise<void> {
  await getTransport().sendMail({ from: config.mailFrom, ...mail, attachments: mail.attachments?.map((a) => ({ ...a })) });
}
