import { afterAll, beforeAll } from 'vitest';
import { publicPageCache } from '@server/pages/page-cache';

/**
 * For a test file that must see a change on the next public page: every request checks the page's
 * version instead of trusting the cache for its usual second. Restored after the file, since the
 * files of one worker share the server's modules.
 */
export function checkPageVersionOnEveryRequest(): void {
  let trust = 0;
  beforeAll(() => {
    trust = publicPageCache.revalidateAfterMs;
    publicPageCache.revalidateAfterMs = 0;
  });
  afterAll(() => {
    publicPageCache.revalidateAfterMs = trust;
  });
}
