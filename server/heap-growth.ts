import v8 from 'node:v8';
import { config } from './config';

/**
 * How far V8 lets a web process's heap grow past what is live before it collects the old generation:
 * `1 + HEAP_GROWING_PERCENT / 100` (V8's `--heap-growing-percent`; 0 leaves V8's own factor, up to 4 ×).
 * A crowd's requests leave short-lived garbage that outlives a few young collections (a request waits
 * its turn, see visitor-turns.ts); with V8's own factor the heap grew to about 2 × its idle size under
 * 200 visitors and stayed there. At 20 % it is collected sooner, peaks lower and settles near idle, and
 * the bench measured no loss of pages per second (`npm run bench -- morning`, the memory row).
 */
export function boundHeapGrowth(percent = config.heapGrowingPercent): void {
  if (percent > 0) v8.setFlagsFromString(`--heap-growing-percent=${percent}`);
}
