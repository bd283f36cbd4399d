import { Router } from 'express';
import { databaseReachable } from '../services/platform/health';

export const healthRouter = Router();

// Load balancers poll this; it answers 503 when the database does not.
healthRouter.get('/health', async (_req, res) => {
  const up = await databaseReachable();
  res.status(up ? 200 : 503).json({ status: up ? 'ok' : 'degraded', db: up ? 'ok' : 'down' });
});
