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
  attachments: z.array(z.object({ filename: z.string(), contentType: z.string(), contentBase64: z.string() })).optional(),
});
export type MailJob = z.infer<typeof MailJobSchema>;

export function encodeMail(mail: OutgoingMail): MailJob {
  return {
    to: mail.to,
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
    ...(job.attachments ? { attachments: job.attachments.map((a) => ({ filename: a.filename, contentType: a.contentType, content: Buffer.from(a.contentBase64, 'base64') })) } : {}),
  };
}
