import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';
import { CaughtMail } from '../models/caught-mail';

const addresses = (a: AddressObject | AddressObject[] | undefined) =>
  (Array.isArray(a) ? a : a ? [a] : []).map((x) => x.text).join(', ');

/**
 * The demo-mode SMTP catcher: accepts every message on loopback and keeps it in the database,
 * where the site admin reads it in the app. Nothing is delivered anywhere.
 */
export function startMailCatcher(port: number, host = '127.0.0.1'): Promise<SMTPServer> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    size: 5 * 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((m) =>
          CaughtMail.create({
            from: addresses(m.from),
            to: addresses(m.to),
            subject: m.subject ?? '(no subject)',
            text: m.text ?? '',
            html: typeof m.html === 'string' ? m.html : null,
          }),
        )
        .then(() => callback())
        .catch((err: Error) => callback(err));
    },
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => resolve(server));
  });
}
