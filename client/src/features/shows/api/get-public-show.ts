import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PublicEvent } from '@shared/schemas/public-event';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const getPublicShow = (slug: string) => api<{ event: PublicEvent }>(`/api/public/events/${encodeURIComponent(slug)}`);
export const publicShowQueryOptions = (slug: string) => queryOptions({ queryKey: showKeys.public(slug), queryFn: () => getPublicShow(slug) });
export const usePublicShow = (slug: string) => useQuery(publicShowQueryOptions(slug));
