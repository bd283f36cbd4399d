import { Router } from 'express';
import { sequelize } from '../db/sequelize';

export const healthRouter = Router();

// Load balancers poll this; it answers 503 when the database does not.
healthRouter.get('/health', async (_req, res) => {
  const db = await sequelize.query('SELECT 1').then(() => 'ok' as const, () => 'down' as const);
  res.status(db === 'ok' ? 200 : 503).json({ status: db === 'ok' ? 'ok' : 'degraded', db });
});
