// Visitors with autocannon, on loopback only, bounded in time: a browser's headers on every request.
import autocannon from 'autocannon';
import { BROWSER_HEADERS } from './bench-server';

export type Visit = { rps: number; p50: number; p99: number; errors: number; requests: number; /** What the errors were: "12 timed out (10 s), 3× 503". */ errorKinds: string };

/** `connections` visitors asking for `paths` in turn (each connection walks the list) for `seconds`. */
export async function visit(base: string, paths: string[], connections: number, seconds: number, headers: Record<string, string> = {}): Promise<Visit> {
  const r = await autocannon({
    url: base,
    connections,
    duration: seconds,
    headers: { ...BROWSER_HEADERS, ...headers },
    requests: paths.map((path) => ({ method: 'GET' as const, path })),
  });
  const statuses = Object.entries(r.statusCodeStats ?? {}).filter(([code, st]) => !code.startsWith('2') && st.count);
  const kinds = [
    ...(r.timeouts ? [`${r.timeouts} timed out (10 s)`] : []),
    ...(r.errors > r.timeouts ? [`${r.errors - r.timeouts} connection errors`] : []),
    ...statuses.map(([code, st]) => `${st.count}× ${code}`),
  ];
  return { rps: r.requests.average, p50: r.latency.p50, p99: r.latency.p99, errors: r.errors + r.non2xx, requests: r.requests.total, errorKinds: kinds.join(', ') };
}
