// One web process of several (`npm start -- --web-processes N`): Node's cluster module shares the one
// port between them. The primary runs the fakes, the mail catcher and the job workers; this serves.
import { config } from '../config';
import { keepRunningThroughDatabaseLoss } from '../process-guard';
import { listen, logger } from '../index';
import { pointPaymentsAtFake } from '../payments/client';
import { pointStorageAtFakeS3 } from '../storage/index';
import { stopGracefully } from './graceful-stop';

keepRunningThroughDatabaseLoss();
if (config.payments.mode === 'fake') pointPaymentsAtFake({ host: '127.0.0.1', port: config.payments.fakePort });
if (process.env.PLACARD_FAKE_S3_ENDPOINT) pointStorageAtFakeS3(process.env.PLACARD_FAKE_S3_ENDPOINT);
const server = await listen();
logger.info({ pid: process.pid }, 'web process listening');
process.send?.({ listening: true });
for (const signal of ['SIGINT', 'SIGTERM'] as const) process.on(signal, () => void stopGracefully(server));
