import { randomUUID } from 'node:crypto';
import { z } from 'zod';
import type { OutgoingMail } from './mailer';

/**
 * A mail as it waits in the queue (JSON in PostgreSQL): attachments travel as base64, so a PDF
 * made at request time survives the wait and a restart. Parsed again when a worker takes it.
 */
export const MailJobSchema = z.object({
  to: z.string().min(3),
  subject: z.string(),
  text: z.string(),
  html: z.string().optional(),
  messageId: z.string().optional(),
  /** How many times the server's answer to the whole message was lost (each retry waits longer). */
  lostAcks: z.number().int().min(0).optional(),
  attachments: z.array(z.object({ filename: z.string(), contentType: z.string(), contentBase64: z.string() })).optional(),
});
export type MailJob = z.infer<typeof MailJobSchema>;

/** A Message-ID of our own for one notice (RFC 5322 shape); the part after @ names the sender's domain. */
export const newMessageId = (from: string) => `<${randomUUID()}@${/@([^>\s]+)/.exec(from)?.[1] ?? 'placard.invalid'}>`;

export function encodeMail(mail: OutgoingMail, from: string): MailJob {
  return {
    to: mail.to,
    messageId: mail.messageId ?? newMessageId(from),
    subject: mail.subject,
    text: mail.text,
    ...(mail.html !== undefined ? { html: mail.html } : {}),
    ...(mail.attachments?.length
      ? { attachments: mail.attachments.map((a) => ({ filename: a.filename, contentType: a.contentType, contentBase64: a.content.toString('base64') })) }
      : {}),
  };
}

export function decodeMail(data: unknown): OutgoingMail {
  const job = MailJobSchema.parse(data);
  return {
    to: job.to,
    subject: job.subject,
    text: job.text,
    ...(job.html !== undefined ? { html: job.html } : {}),
    ...(job.messageId !== undefined ? { messageId: job.messageId } : {}),
    ...(job.attachments ? { attachments: job.attachments.map((a) => ({ filename: a.filename, contentType: a.contentType, content: Buffer.from(a.contentBase64, 'base64') })) } : {}),
  };
}
