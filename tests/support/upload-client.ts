// The uploaders of `npm run bench` (tests/bench/upload-load.ts), in a process of their own so that
// building and sending large request bodies never slows the process that times the visitor.
// Forked with IPC: receives one UploadOrder, keeps `parallel` uploads going for `seconds`, and
// answers with how many uploads ended in each status (0: the request failed).
import { readFileSync } from 'node:fs';

export type UploadOrder = { url: string; cookie: string; csrf: string; files: string[]; parallel: number; seconds: number };
export type UploadTally = [status: number, count: number][];

async function run(order: UploadOrder): Promise<UploadTally> {
  const files = order.files.map((f) => new Blob([new Uint8Array(readFileSync(f))], { type: 'image/jpeg' }));
  const until = Date.now() + order.seconds * 1000;
  const tally = new Map<number, number>();
  const one = async () => {
    while (Date.now() < until) {
      const form = new FormData();
      files.forEach((blob, i) => form.append('photos', blob, `p${i}.jpg`));
      const res = await fetch(order.url, { method: 'POST', headers: { cookie: order.cookie, 'x-csrf-token': order.csrf }, body: form }).catch(() => null);
      await res?.arrayBuffer().catch(() => undefined);
      const status = res?.status ?? 0;
      tally.set(status, (tally.get(status) ?? 0) + 1);
    }
  };
  await Promise.all(Array.from({ length: order.parallel }, one));
  return [...tally];
}

process.once('message', (order) => {
  void run(order as UploadOrder).then((tally) => process.send!(tally, () => process.exit(0)));
});
