import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';

import { api, withQuery } from '@/lib/api';
import { authClient } from '@/lib/auth-client';
import { sendBody, type UploadProgress } from '@/lib/upload';
import type { CatalogueSearchResult, CatalogueSummary } from '@/shared/schemas/target';
import type { CsvImportError, CsvLayout, CsvMapping } from '@/shared/targets/csv-import';
import type { CatalogueObject, TargetKind } from '@/shared/targets/schema';

/** Search answers only change when a catalogue is imported or deleted here, or the night turns. */
export const CATALOGUE_SEARCH_STALE_MS = 5 * 60_000;
export const CATALOGUES_STALE_MS = 5 * 60_000;
export const CLUBS_STALE_MS = 5 * 60_000;

export type CatalogueSearchParams = {
  q: string;
  kinds: TargetKind[];
  minSizeArcmin?: number;
  maxSizeArcmin?: number;
  faintestMag?: number;
  /** Only what spends at least an hour of darkness above the default site's limit. */
  wellPlaced: boolean;
};

export type CatalogueSearchResponse = {
  results: CatalogueSearchResult[];
  /** How many matched before the limit, when the server says. */
  total?: number;
  night: { siteId: string; siteName: string; date: string } | null;
};

export type CataloguePreview = {
  layout: CsvLayout;
  count: number;
  sample: CatalogueObject[];
  errors: CsvImportError[];
  errorCount: number;
  skipped: { duplicate: number; nonexistent: number };
};

export type CatalogueImportResult = { catalogue: CatalogueSummary; imported: number; skippedRows: number };

export const catalogueKeys = {
  all: ['catalogues'] as const,
  list: () => [...catalogueKeys.all, 'list'] as const,
  search: (p: CatalogueSearchParams) => [...catalogueKeys.all, 'search', p] as const,
};

export const clubKeys = {
  all: ['clubs'] as const,
  managed: () => [...clubKeys.all, 'managed'] as const,
};

const text = (n: number | undefined) => (n === undefined ? undefined : String(n));

function searchPath(p: CatalogueSearchParams): string {
  return withQuery('/api/catalogue/search', {
    q: p.q.trim() || undefined,
    kind: p.kinds.length ? p.kinds.join(',') : undefined,
    minSizeArcmin: text(p.minSizeArcmin),
    maxSizeArcmin: text(p.maxSizeArcmin),
    faintestMag: text(p.faintestMag),
    wellPlaced: p.wellPlaced ? '1' : undefined,
    limit: '50',
  });
}

/** Built-in list plus the user's and clubs' catalogues; the previous answer stays while typing. */
export function useCatalogueSearchQuery(params: CatalogueSearchParams) {
  return useQuery({
    queryKey: catalogueKeys.search(params),
    queryFn: ({ signal }) => api.get<CatalogueSearchResponse>(searchPath(params), signal),
    staleTime: CATALOGUE_SEARCH_STALE_MS,
    placeholderData: keepPreviousData,
  });
}

export function useCataloguesQuery() {
  return useQuery({
    queryKey: catalogueKeys.list(),
    queryFn: ({ signal }) => api.get<{ catalogues: CatalogueSummary[] }>('/api/catalogues', signal).then((r) => r.catalogues),
    staleTime: CATALOGUES_STALE_MS,
  });
}

/** Parses the CSV on the server with the detected (or the given) column mapping; stores nothing. */
export function useCataloguePreviewMutation() {
  return useMutation({
    mutationFn: ({ csv, mapping }: { csv: string; mapping?: CsvMapping }) =>
      sendBody<CataloguePreview>({
        url: withQuery('/api/catalogues/preview', { mapping: mapping ? JSON.stringify(mapping) : undefined }),
        body: csv,
        contentType: 'text/csv',
      }),
  });
}

export type CatalogueImportArgs = { csv: string; name: string; clubId?: string; mapping?: CsvMapping; acceptErrors: boolean };

/** Uploads and stores a catalogue; `progress` follows the upload, then the server parses and stores. */
export function useImportCatalogueMutation() {
  const queryClient = useQueryClient();
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const mutation = useMutation({
    mutationFn: ({ csv, name, clubId, mapping, acceptErrors }: CatalogueImportArgs) => {
      setProgress({ loadedBytes: 0, totalBytes: 1 });
      const url = withQuery('/api/catalogues', { name, clubId, mapping: mapping ? JSON.stringify(mapping) : undefined, acceptErrors: acceptErrors ? '1' : '0' });
      return sendBody<CatalogueImportResult>({ url, body: csv, contentType: 'text/csv', onProgress: setProgress });
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.all }),
  });
  return { ...mutation, progress };
}

export function useDeleteCatalogueMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.del(`/api/catalogues/${encodeURIComponent(id)}`),
    onSettled: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.all }),
  });
}

export type ManagedClub = { id: string; name: string };

/** Roles may be stored as a comma list ("admin,member"). */
const canManage = (role: unknown) => typeof role === 'string' && role.split(',').some((r) => ['owner', 'admin'].includes(r.trim()));

async function fetchManagedClubs(): Promise<ManagedClub[]> {
  const { data, error } = await authClient.organization.list();
  if (error) throw new Error(error.message ?? 'Could not load your clubs');
  const clubs = data ?? [];
  const roles = await Promise.all(clubs.map((c) => authClient.organization.getActiveMemberRole({ query: { organizationId: c.id } })));
  return clubs.filter((_c, i) => canManage(roles[i]?.data?.role)).map((c) => ({ id: c.id, name: c.name }));
}

/** Clubs where the user is an owner or admin: the ones a catalogue can be shared with. */
export function useManagedClubsQuery() {
  return useQuery({ queryKey: clubKeys.managed(), queryFn: fetchManagedClubs, staleTime: CLUBS_STALE_MS });
}
