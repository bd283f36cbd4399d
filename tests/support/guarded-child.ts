// A child process with the server's process guard: it throws what it is told (argv[2]) from an event
// handler with no listener, the way a pg client does when its connection dies between queries.
import { EventEmitter } from 'node:events';
import { keepRunningThroughDatabaseLoss } from '@server/process-guard';

keepRunningThroughDatabaseLoss();
const kind = process.argv[2];
const err = Object.assign(new Error(kind === 'db' ? 'terminating connection due to unexpected postmaster exit' : 'a bug'), kind === 'db' ? { code: '57P01' } : {});
setTimeout(() => new EventEmitter().emit('error', err), 10);
setTimeout(() => {
  process.send?.('still running');
  process.exit(0);
}, 300);
