// `npm run db:seed`: loads the demo scenario's pending seeders (each runs once).
import { ensureDatabase } from './cluster';

await ensureDatabase();
await import('../models/index');
const { migrate, seedDemo } = await import('./migrator');
const { sequelize } = await import('./sequelize');
await migrate();
const applied = await seedDemo();
console.log(applied.length ? `Seeded: ${applied.join(', ')}` : 'The demo scenario is already loaded.');
// The seeders queue mail and card jobs (for the server's workers): close the queue too, or the process never ends.
const { stopJobQueue } = await import('../jobs/queue');
await stopJobQueue();
await sequelize.close();
