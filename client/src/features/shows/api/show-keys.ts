/**
 * Every cache key of the shows feature, made here and nowhere else. A show's screens hang their keys
 * under `showKeys.detail(id)` (show-day and judging derive theirs from it), so refreshing a show
 * refreshes them all; one key names one endpoint's answer in one shape (tests/client/query-keys.test.ts).
 */
export const showKeys = {
  all: ['shows'] as const,
  mine: () => [...showKeys.all, 'mine'] as const,
  open: () => [...showKeys.all, 'open'] as const,
  public: (slug: string) => [...showKeys.all, 'public', slug] as const,
  detail: (id: number) => [...showKeys.all, id] as const,
  people: (id: number) => [...showKeys.detail(id), 'people'] as const,
  peoplesChoice: (id: number) => [...showKeys.detail(id), 'peoples-choice'] as const,
  invitation: (token: string) => ['invitations', token] as const,
};

/** The signed-in person's own entries, and what hangs under one entry. */
export const entryKeys = {
  all: ['entries'] as const,
  mine: () => [...entryKeys.all, 'mine'] as const,
  detail: (entryId: number) => [...entryKeys.all, entryId] as const,
};
