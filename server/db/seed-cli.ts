// `npm run db:seed`: loads the demo scenario's pending seeders (each runs once).
import { ensureDatabase } from './cluster';

await ensureDatabase();
await import('../models/index');
const { migrate, seedDemo } = await import('./migrator');
const { sequelize } = await import('./sequelize');
await migrate();
const applied = await seedDemo();
console.log(applied.length ? `Seeded: ${applied.join(', ')}` : 'The demo scenario is already loaded.');
await sequelize.close();
