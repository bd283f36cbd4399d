/**
 * Bursts of new voters from one address: one machine clearing its cookies shows as many first votes from
 * one address in a few minutes. Each address's votes are cut into windows that start at a vote and last
 * `windowMs`; a window holding at least `minVotes` votes is a burst. Every vote is a new voter (one vote
 * per voter), so the count is the number of new voters.
 */
export type VoteSeen = { addressHash: string; at: Date; voided: boolean };
export type VoteBurst = { addressHash: string; from: Date; to: Date; votes: number; voided: number };

export function voteBursts(votes: readonly VoteSeen[], opts: { windowMs: number; minVotes: number }): VoteBurst[] {
  const byAddress = new Map<string, VoteSeen[]>();
  for (const v of votes) byAddress.set(v.addressHash, [...(byAddress.get(v.addressHash) ?? []), v]);
  const bursts: VoteBurst[] = [];
  for (const [addressHash, seen] of byAddress) {
    const sorted = [...seen].sort((a, b) => a.at.getTime() - b.at.getTime());
    for (let start = 0; start < sorted.length; ) {
      const from = sorted[start]!.at;
      let end = start;
      while (end + 1 < sorted.length && sorted[end + 1]!.at.getTime() - from.getTime() < opts.windowMs) end++;
      const group = sorted.slice(start, end + 1);
      if (group.length >= opts.minVotes) bursts.push({ addressHash, from, to: group[group.length - 1]!.at, votes: group.length, voided: group.filter((v) => v.voided).length });
      start = end + 1;
    }
  }
  // Newest first: the organiser looks at what is happening now.
  return bursts.sort((a, b) => b.from.getTime() - a.from.getTime());
}
