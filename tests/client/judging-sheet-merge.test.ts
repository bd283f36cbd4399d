import { describe, expect, it } from 'vitest';
import type { JudgeView } from '@shared/schemas/judging';
import { carSheet } from '@client/features/judging/offline/sheet-merge';
import type { LocalLine } from '@client/features/judging/offline/sheet-store';

const phoneA = '00000000-0000-4000-8000-00000000000a';
const phoneB = '00000000-0000-4000-8000-00000000000b';
const dayAhead = new Date(Date.now() + 24 * 3600_000 - 60_000).toISOString();

const view = (points: number, clientId: string, deviceId: string): JudgeView => ({
  event: { id: 1, name: 'Show', slug: 'show', status: 'judging', judgingOpen: true, closedReason: null },
  criteria: [{ id: 7, name: 'Paint', maxPoints: 10, weight: 1, position: 0 }],
  cars: [],
  expected: [],
  scores: [{ entryId: 3, criterionId: 7, points, comment: '', deviceTime: new Date().toISOString(), clientId, deviceId }],
  notes: [],
});
// Phone A, a day fast, wrote 3 and heard back at its clock's 1000.
const sentFromA: Record<string, LocalLine> = {
  '3:7': { key: '3:7', kind: 'score', eventId: 1, state: 'sent', answeredAt: 1000, item: { clientId: 'a-1', deviceTime: dayAhead, sequence: 1, entryId: 3, criterionId: 7, points: 3, comment: '' } },
};

describe('the phone whose line another phone of the judge replaced', () => {
  it('shows the server’s later value and says it was changed on the other phone, however fast its own clock', () => {
    const line = carSheet(view(8, 'b-1', phoneB), sentFromA, 3, { deviceId: phoneA, fetchedAt: 2000 }).lines[7]!;
    expect(line).toMatchObject({ points: 8, state: 'replaced', message: expect.stringContaining('other phone') });
  });

  it('keeps its own line while the server’s copy was read before its answer, and when the server holds its own line', () => {
    expect(carSheet(view(8, 'b-1', phoneB), sentFromA, 3, { deviceId: phoneA, fetchedAt: 500 }).lines[7]).toMatchObject({ points: 3, state: 'sent' });
    expect(carSheet(view(3, 'a-1', phoneA), sentFromA, 3, { deviceId: phoneA, fetchedAt: 2000 }).lines[7]).toMatchObject({ points: 3, state: 'sent' });
  });

  it('says so at once when the server’s answer named the line replaced', () => {
    const answered: Record<string, LocalLine> = { '3:7': { ...sentFromA['3:7']!, state: 'replaced', message: 'Changed later on your other phone: the server keeps that value.' } };
    expect(carSheet(view(8, 'b-1', phoneB), answered, 3, { deviceId: phoneA, fetchedAt: 500 }).lines[7]).toMatchObject({ points: 8, state: 'replaced' });
  });
});
