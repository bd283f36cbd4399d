/** The judging screens' cache keys. */
export const judgingKeys = {
  all: ['judging'] as const,
  myShows: () => [...judgingKeys.all, 'shows'] as const,
  mine: (eventId: number) => [...judgingKeys.all, eventId, 'mine'] as const,
  progress: (eventId: number) => [...judgingKeys.all, eventId, 'progress'] as const,
  judges: (eventId: number) => [...judgingKeys.all, eventId, 'judges'] as const,
};
