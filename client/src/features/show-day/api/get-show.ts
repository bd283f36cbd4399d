import { useQuery } from '@tanstack/react-query';
import { showQueryOptions } from '@client/features/shows/api/get-show';

/**
 * The show as the show-day screens read it: the one cached answer of GET /api/events/:id (its key and
 * shape belong to the shows feature), with the event picked out. Never a second query under that key.
 */
export const useShow = (id: number) => useQuery({ ...showQueryOptions(id), select: (r) => r.event });
