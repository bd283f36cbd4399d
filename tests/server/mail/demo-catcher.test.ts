import { afterAll, describe, expect, it } from 'vitest';
import { createServer, type Server } from 'node:net';
import type { AddressInfo } from 'node:net';
import '@server/models/index';
import { startDemoMailCatcher, type DemoCatcher } from '@server/mail/demo-catcher';
import { createMailSender } from '@server/mail/mailer';
import { uniqueEmail } from '../../support/factories';
import { waitForMail } from '../../support/mailbox';

// npm start with MAIL_CATCHER_PORT already held by another program: the catcher moves to a free
// port and mail goes there, to this Placard's own Caught mail (never to whatever holds the port).
describe('the demo mail catcher when its port is taken', () => {
  let squatter: Server;
  let catcher: DemoCatcher | undefined;
  afterAll(async () => {
    catcher?.server.close(() => undefined);
    await new Promise((r) => squatter?.close(r));
  });

  it('listens on a free port instead and the mail sent there is caught', async () => {
    squatter = await new Promise<Server>((resolve) => {
      const s = createServer(() => undefined).listen(0, '127.0.0.1', () => resolve(s));
    });
    const taken = (squatter.address() as AddressInfo).port;
    catcher = await startDemoMailCatcher(taken);
    expect(catcher.wantedPort).toBe(taken);
    expect(catcher.port).not.toBe(taken);
    expect(catcher.smtpUrl).toBe(`smtp://127.0.0.1:${catcher.port}`);

    const to = uniqueEmail('moved');
    await createMailSender(catcher.smtpUrl)({ to, subject: 'Caught on the moved port', text: 'hello' });
    expect((await waitForMail(to)).subject).toBe('Caught on the moved port');
  });
});
