import { Router } from 'express';
import { databaseReachable, readyForTraffic } from '../services/platform/health';

export const healthRouter = Router();

// Load balancers poll this; it answers 503 when the database does not.
healthRouter.get('/health', async (_req, res) => {
  const up = await databaseReachable();
  res.status(up ? 200 : 503).json({ status: up ? 'ok' : 'degraded', db: up ? 'ok' : 'down' });
});

// Orchestrators route traffic by this one: 503 while the process drains on SIGTERM or the database is away.
healthRouter.get('/ready', async (_req, res) => {
  const ready = await readyForTraffic();
  res.status(ready ? 200 : 503).json({ status: ready ? 'ready' : 'not ready' });
});
