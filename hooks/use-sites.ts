import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api, isApiError } from '@/lib/api';
import type { Site, SiteInput, SiteUpdate } from '@/shared/schemas/site';
import { tonightKeys } from '@/hooks/use-tonight';

/** Sites change rarely and only through this client, which invalidates on every write. */
export const SITES_STALE_MS = 5 * 60_000;

export const siteKeys = {
  all: ['sites'] as const,
  list: () => [...siteKeys.all, 'list'] as const,
  detail: (id: string) => [...siteKeys.all, 'detail', id] as const,
};

export function useSitesQuery() {
  return useQuery({
    queryKey: siteKeys.list(),
    queryFn: ({ signal }) => api.get<{ sites: Site[] }>('/api/sites', signal).then((r) => r.sites),
    staleTime: SITES_STALE_MS,
  });
}

export function useSiteQuery(id: string) {
  return useQuery({
    queryKey: siteKeys.detail(id),
    queryFn: ({ signal }) => api.get<{ site: Site }>(`/api/sites/${encodeURIComponent(id)}`, signal).then((r) => r.site),
    staleTime: SITES_STALE_MS,
    enabled: id.length > 0,
  });
}

function useInvalidateSites() {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: siteKeys.all }),
      // Tonight embeds the site, and the default site decides which night is shown.
      queryClient.invalidateQueries({ queryKey: tonightKeys.all }),
    ]);
}

export function useCreateSiteMutation() {
  const invalidate = useInvalidateSites();
  return useMutation({
    mutationFn: (input: SiteInput) => api.post<{ site: Site }>('/api/sites', input).then((r) => r.site),
    onSettled: invalidate,
  });
}

/** The stored site a 409 answer carries, if the error is a version conflict. */
export function conflictOf(error: unknown): Site | null {
  if (!isApiError(error, 409)) return null;
  // The server puts the stored copy inside the error envelope: `{ error: { code, current } }`.
  const body = error.body as { error?: { current?: Site }; current?: Site } | undefined;
  return body?.error?.current ?? body?.current ?? null;
}

/**
 * Saves a site guarded by its version. On a 409 the mutation exposes `conflict` (the version
 * stored on the server) so the form can offer to load it or to overwrite it.
 */
export function useUpdateSiteMutation(id: string) {
  const invalidate = useInvalidateSites();
  const mutation = useMutation({
    mutationFn: (update: SiteUpdate) => api.put<{ site: Site }>(`/api/sites/${encodeURIComponent(id)}`, update).then((r) => r.site),
    onSettled: invalidate,
  });
  return { ...mutation, conflict: conflictOf(mutation.error) };
}

export function useDeleteSiteMutation() {
  const queryClient = useQueryClient();
  const invalidate = useInvalidateSites();
  return useMutation({
    mutationFn: (id: string) => api.del(`/api/sites/${encodeURIComponent(id)}`),
    onSuccess: (_data, id) => queryClient.removeQueries({ queryKey: siteKeys.detail(id) }),
    onSettled: invalidate,
  });
}

/** The per-line errors a refused horizon CSV comes back with (400 `invalid-csv`). */
export function csvRowsOf(error: unknown): { line: number; message: string }[] | null {
  if (!isApiError(error, 400) || error.code !== 'invalid-csv') return null;
  const body = error.body as { error?: { rows?: { line: number; message: string }[] } } | undefined;
  return body?.error?.rows ?? [];
}

/**
 * Stores a horizon CSV on a saved site straight away (`PUT /api/sites/:id/horizon?version=N`),
 * guarded by the version like any save; 409 exposes `conflict`, 400 the file's bad lines.
 */
export function useUploadHorizonMutation(id: string) {
  const invalidate = useInvalidateSites();
  const mutation = useMutation({
    mutationFn: ({ csv, version }: { csv: string; version: number }) =>
      api.putText<{ site: Site }>(`/api/sites/${encodeURIComponent(id)}/horizon?version=${version}`, csv, 'text/csv').then((r) => r.site),
    onSettled: invalidate,
  });
  return { ...mutation, conflict: conflictOf(mutation.error) };
}
