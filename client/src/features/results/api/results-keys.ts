import { entryKeys } from '@client/features/shows/api/show-keys';

/** The results screens' cache keys. */
export const resultsKeys = {
  all: ['results'] as const,
  review: (eventId: number) => [...resultsKeys.all, eventId, 'review'] as const,
  rules: (eventId: number) => [...resultsKeys.all, eventId, 'rules'] as const,
  awards: (eventId: number) => [...resultsKeys.all, eventId, 'awards'] as const,
  readOut: (eventId: number) => [...resultsKeys.all, eventId, 'read-out'] as const,
  ownResults: (entryId: number) => [...entryKeys.detail(entryId), 'results'] as const,
};
