import type { AddressInfo } from 'node:net';
import type { SMTPServer } from 'smtp-server';
import { startMailCatcher } from './catcher';

export type DemoCatcher = { server: SMTPServer; port: number; smtpUrl: string; wantedPort: number };

/**
 * The demo's mail catcher on its configured port, or, when something else holds that port (another
 * program, another copy of Placard), on a free one: mail must reach this Placard's own catcher, never
 * whatever listens there. The caller sends mail to `smtpUrl` and says when the port moved.
 */
export async function startDemoMailCatcher(wantedPort: number): Promise<DemoCatcher> {
  const server = await startMailCatcher(wantedPort).catch((err: NodeJS.ErrnoException) => {
    if (err.code !== 'EADDRINUSE') throw err;
    return startMailCatcher(0);
  });
  const { port } = server.server.address() as AddressInfo;
  return { server, port, smtpUrl: `smtp://127.0.0.1:${port}`, wantedPort };
}
