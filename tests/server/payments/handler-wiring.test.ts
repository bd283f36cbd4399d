import { describe, expect, it } from 'vitest';
import { paymentHandlerFor } from '@server/payments/handlers';
import { handleEntryPayment } from '@server/services/entries/entry-payments';

// Runs in the isolated project: a fresh module graph, so nothing else has made an app in this process.
describe('payment webhook handlers', () => {
  it('are wired where the app is assembled, not as a side effect of importing a service', async () => {
    expect(paymentHandlerFor('entry')).toBeUndefined();
    const { createApp } = await import('@server/app');
    createApp();
    expect(paymentHandlerFor('entry')).toBe(handleEntryPayment);
    // A second app in the same process (tests, several listeners) wires the same handler again without complaint.
    createApp();
    expect(paymentHandlerFor('entry')).toBe(handleEntryPayment);
  });
});
