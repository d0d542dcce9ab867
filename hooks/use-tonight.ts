import { keepPreviousData, useQuery } from '@tanstack/react-query';

import { api, isApiError, withQuery } from '@/lib/api';
import type { Night } from '@/shared/schemas/night';
import type { Site } from '@/shared/schemas/site';

/** A night's ephemeris does not change; only "which night is tonight" does, slowly. */
export const TONIGHT_STALE_MS = 10 * 60_000;

export type TonightResponse = { site: Site; night: Night };

export const tonightKeys = {
  all: ['tonight'] as const,
  night: (siteId: string | undefined, date: string | undefined) => [...tonightKeys.all, siteId ?? 'default', date ?? 'current'] as const,
};

/** The night for a site and date; both optional (default site, the current night in its zone). */
export function useTonightQuery(siteId: string | undefined, date: string | undefined) {
  return useQuery({
    queryKey: tonightKeys.night(siteId, date),
    queryFn: ({ signal }) => api.get<TonightResponse>(withQuery('/api/tonight', { siteId, date }), signal),
    staleTime: TONIGHT_STALE_MS,
    placeholderData: keepPreviousData,
  });
}

/** The API's way of saying the user has not described a site yet. */
export function isNoSiteError(error: unknown): boolean {
  return isApiError(error, 404) && error.code === 'no-site';
}
