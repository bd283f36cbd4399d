// What every bench table shares: the machine's state when it was measured, medians, percentiles and
// a table printed with its goal and whether the goal is met. The machine is shared, so only same-run
// ratios mean much; the load average says how busy it was meanwhile.
import { readFileSync } from 'node:fs';
import os from 'node:os';

/** "2026-12-05 03:10 UTC, load average 9.45 5.45 4.90 on 2 cores" */
export function machineLine(): string {
  const when = new Date().toISOString().replace('T', ' ').slice(0, 16);
  return `${when} UTC, load average ${os.loadavg().map((l) => l.toFixed(2)).join(' ')} on ${os.cpus().length} cores`;
}

export const median = (xs: number[]): number => {
  if (xs.length === 0) return NaN;
  const s = [...xs].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
};

/** The p-th percentile (0–100) by the nearest-rank rule (common practice). */
export const percentile = (xs: number[], p: number): number => {
  if (xs.length === 0) return NaN;
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.max(0, Math.ceil((p / 100) * s.length) - 1))]!;
};

export const ms = (x: number) => (Number.isFinite(x) ? `${x < 10 ? x.toFixed(1) : Math.round(x).toLocaleString('en-GB')} ms` : '–');
export const kb = (bytes: number) => `${(bytes / 1024).toFixed(1)} KB`;
export const mb = (bytes: number) => `${Math.round(bytes / 2 ** 20)} MB`;
export const ratio = (x: number) => (Number.isFinite(x) ? `${x.toFixed(2)} ×` : '–');
export const rate = (x: number) => `${Math.round(x).toLocaleString('en-GB')} req/s`;

export type Row = { what: string; measured: string; goal?: string; met?: boolean | null };

/** Prints a titled table: what, measured, goal, met (a row with no goal prints none). */
export function printTable(title: string, rows: Row[], notes: string[] = []): void {
  const w = (k: 'what' | 'measured' | 'goal') => Math.max(k.length, ...rows.map((r) => (r[k] ?? '').length));
  const [a, b, c] = [w('what'), w('measured'), w('goal')];
  const line = (r: { what: string; measured: string; goal?: string; met?: string }) =>
    `| ${r.what.padEnd(a)} | ${r.measured.padEnd(b)} | ${(r.goal ?? '').padEnd(c)} | ${(r.met ?? '').padEnd(3)} |`;
  console.log(`\n${title}`);
  console.log(`(${machineLine()})`);
  console.log(line({ what: 'what', measured: 'measured', goal: 'goal', met: 'met' }));
  console.log(`|${'-'.repeat(a + 2)}|${'-'.repeat(b + 2)}|${'-'.repeat(c + 2)}|-----|`);
  for (const r of rows) console.log(line({ ...r, met: r.met === undefined || r.met === null ? '' : r.met ? 'yes' : 'NO' }));
  for (const n of notes) console.log(n);
}

/** Runs `fn` n times and returns every result (the caller takes the medians it needs). */
export async function repeat<T>(n: number, fn: (i: number) => Promise<T>): Promise<T[]> {
  const out: T[] = [];
  for (let i = 0; i < n; i++) out.push(await fn(i));
  return out;
}

/** Resident memory of a process from /proc, in bytes (NaN once it is gone). */
export function rssOf(pid: number): number {
  try {
    const status = readFileSync(`/proc/${pid}/status`, 'utf8');
    const kib = Number(/VmRSS:\s+(\d+)/.exec(status)?.[1] ?? NaN);
    return kib * 1024;
  } catch {
    return NaN;
  }
}

export const sleep = (msToWait: number) => new Promise((r) => setTimeout(r, msToWait));
