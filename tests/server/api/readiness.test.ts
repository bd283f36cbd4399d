import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../../support/api-client';
import { startDraining } from '@server/services/platform/health';

// What a load balancer asks: /api/health says the process and its database live; /api/ready says
// it should get traffic. A process that is stopping (SIGTERM) drains: ready no longer, alive still.
// (Isolated project: draining cannot be undone in this process.)
describe('readiness for traffic', () => {
  it('is ready while running, and not ready once the process drains, while still alive', async () => {
    expect((await request(testApp()).get('/api/ready')).body).toEqual({ status: 'ready' });
    startDraining();
    const ready = await request(testApp()).get('/api/ready');
    expect([ready.status, ready.body]).toEqual([503, { status: 'not ready' }]);
    expect((await request(testApp()).get('/api/health')).status).toBe(200);
  });
});
