import { buildQueryKey } from './get-build';

/** The build log's and the questions' query keys, under the build's own key (deleting a build forgets them too). */
export const buildLogKeys = {
  posts: (buildId: number) => [...buildQueryKey(buildId), 'log'] as const,
  questions: (buildId: number) => [...buildQueryKey(buildId), 'questions'] as const,
};
