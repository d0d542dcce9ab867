import { keepPreviousData, useQuery } from '@tanstack/react-query';

import { api, withQuery } from '@/lib/api';
import type { TargetVisibility } from '@/shared/ephemeris/visibility';
import type { Night } from '@/shared/schemas/night';
import type { Site } from '@/shared/schemas/site';

/** A position's night at a site does not change; only which night is current does, slowly. */
export const VISIBILITY_STALE_MS = 10 * 60_000;

export type VisibilityResponse = { site: Site; night: Night; visibility: TargetVisibility };

export type VisibilityParams = {
  /** Absent: the default site. */
  siteId?: string;
  /** Absent: the current night in the site's zone. */
  date?: string;
  raDeg: number;
  decDeg: number;
};

/** Coordinates rounded to what changes the curve, so tiny float differences share a cache entry. */
const key = (deg: number) => deg.toFixed(4);

export const visibilityKeys = {
  all: ['visibility'] as const,
  of: (p: VisibilityParams) => [...visibilityKeys.all, p.siteId ?? 'default', p.date ?? 'current', key(p.raDeg), key(p.decDeg)] as const,
};

/** Altitude, limit and Moon distance of one position through a night, for the altitude chart. */
export function useVisibilityQuery(params: VisibilityParams) {
  return useQuery({
    queryKey: visibilityKeys.of(params),
    queryFn: ({ signal }) =>
      api.get<VisibilityResponse>(
        withQuery('/api/visibility', { siteId: params.siteId, date: params.date, raDeg: key(params.raDeg), decDeg: key(params.decDeg) }),
        signal,
      ),
    staleTime: VISIBILITY_STALE_MS,
    placeholderData: keepPreviousData,
  });
}
