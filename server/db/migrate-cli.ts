// `npm run db:migrate`: ensures the database and applies pending migrations.
import { ensureDatabase } from './cluster';

await ensureDatabase();
const { migrate } = await import('./migrator');
const { sequelize } = await import('./sequelize');
const applied = await migrate();
console.log(applied.length ? `Applied: ${applied.join(', ')}` : 'The schema is up to date.');
await sequelize.close();
