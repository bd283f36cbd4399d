import { SMTPServer } from 'smtp-server';
import { simpleParser, type ParsedMail } from 'mailparser';
import type { AddressInfo } from 'node:net';

/**
 * A mail server of the test's own on loopback that keeps what arrives in memory, and can be
 * stopped and started again on the same port: the mail server that goes down.
 */
export class SmtpTrap {
  readonly received: ParsedMail[] = [];
  /** When each message arrived (ms), in the order of `received`. */
  readonly arrivedAt: number[] = [];
  private server?: SMTPServer;
  private lostAcks = new Map<string, number>();

  /**
   * After keeping a message, answer `code` instead of 250 the first `times` times a Message-ID arrives:
   * the acknowledgement the sender never gets (the mail server's 421 after the message).
   */
  answerAfterMessage(code: number, times = 1): this {
    this.lostAckCode = code;
    this.lostAckTimes = times;
    return this;
  }
  private lostAckCode = 0;
  private lostAckTimes = 0;
  port = 0;

  async start(): Promise<this> {
    const server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      logger: false,
      onData: (stream, _session, callback) => {
        simpleParser(stream)
          .then((mail) => {
            this.received.push(mail);
            this.arrivedAt.push(Date.now());
            const id = mail.messageId ?? '';
            const seen = (this.lostAcks.get(id) ?? 0) + 1;
            this.lostAcks.set(id, seen);
            if (this.lostAckCode && seen <= this.lostAckTimes) {
              callback(Object.assign(new Error('Service closing transmission channel'), { responseCode: this.lostAckCode }));
            } else callback();
          })
          .catch((err: Error) => callback(err));
      },
    });
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(this.port, '127.0.0.1', () => resolve());
    });
    this.port = (server.server.address() as AddressInfo).port;
    this.server = server;
    return this;
  }

  async stop(): Promise<void> {
    const server = this.server;
    this.server = undefined;
    if (server) await new Promise<void>((resolve) => server.close(() => resolve()));
  }

  get url(): string {
    return `smtp://127.0.0.1:${this.port}`;
  }

  to(address: string): ParsedMail[] {
    return this.received.filter((m) => (Array.isArray(m.to) ? m.to : [m.to]).some((a) => a?.text.includes(address)));
  }
}
