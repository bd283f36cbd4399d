import { describe, expect, it } from 'vitest';
import { voteBursts, type VoteSeen } from '@shared/calc/vote-bursts';

const at = (minute: number) => new Date(Date.UTC(2026, 5, 1, 12, 0) + minute * 60_000);
const votes = (hash: string, minutes: number[], voided: number[] = []): VoteSeen[] => minutes.map((m) => ({ addressHash: hash, at: at(m), voided: voided.includes(m) }));
const opts = { windowMs: 10 * 60_000, minVotes: 5 };

describe('bursts of new voters from one address', () => {
  it('finds five or more first votes from one address within ten minutes, and only those', () => {
    const bursts = voteBursts([...votes('a', [0, 30, 31, 32, 33, 34, 35]), ...votes('b', [0, 2, 4, 6, 8, 10, 12])], opts);
    expect(bursts).toEqual([
      { addressHash: 'a', from: at(30), to: at(35), votes: 6, voided: 0 },
      { addressHash: 'b', from: at(0), to: at(8), votes: 5, voided: 0 },
    ]);
  });

  it('does not count a slow, steady trickle from one address as a burst, and counts voided votes', () => {
    expect(voteBursts(votes('c', [0, 3, 6, 9, 12, 15, 18, 21]), opts)).toEqual([]);
    expect(voteBursts(votes('d', [1, 2, 3, 4, 5], [2, 3]), opts)[0]).toMatchObject({ votes: 5, voided: 2 });
  });
});
