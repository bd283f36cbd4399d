import type { QueryClient } from '@tanstack/react-query';
import { sessionQueryKey } from './get-session';

/**
 * Drops everything cached for the previous visitor except the session entry itself: the header and
 * guards keep watching that one entry, so the new session written into it reaches them at once
 * (clearing the whole cache would leave them watching an entry that is gone).
 */
export function forgetVisitorData(qc: QueryClient): void {
  qc.removeQueries({ predicate: (q) => q.queryKey[0] !== sessionQueryKey[0] });
}
