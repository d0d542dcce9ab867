import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { clubKeys, type TemplateSummary } from '@/hooks/use-clubs';
import { recipeKeys } from '@/hooks/use-recipes';
import { api, isApiError, withQuery } from '@/lib/api';
import type { DryRunResult } from '@/shared/dry-run/types';
import type { RecipeTree } from '@/shared/recipe/types';
import type { TemplateCreate, TemplateDetail, TemplateDiff, TemplateOrigin, TemplateUse as ApiTemplateUse, TemplateVersionNote } from '@/shared/schemas/club-api';
import type { RecipeDetail } from '@/shared/schemas/recipe-api';

/** Templates change only by publishing; a minute is fine, and our own writes invalidate. */
export const TEMPLATES_STALE_MS = 60_000;

/** The tag suggestions of the publish form (issue 7); free tags are allowed too. */
export const SUGGESTED_TAGS = ['broadband', 'narrowband', 'mosaic', 'short nights'] as const;

export type { TemplateDetail, TemplateDiff, TemplateOrigin, TemplateVersionNote };
export type TemplatePublish = TemplateCreate;
export type TemplateUse = ApiTemplateUse;

export const templateKeys = {
  all: ['templates'] as const,
  list: (clubId: string, q: string, tag: string, withRetired = false) => [...templateKeys.all, 'list', clubId, q, tag, withRetired ? 'with-retired' : 'current'] as const,
  detail: (clubId: string, id: string) => [...templateKeys.all, 'detail', clubId, id] as const,
  origin: (recipeId: string) => [...templateKeys.all, 'origin', recipeId] as const,
  diff: (recipeId: string) => [...templateKeys.all, 'diff', recipeId] as const,
};

const clubPath = (clubId: string) => `/api/clubs/${encodeURIComponent(clubId)}/templates`;
const templatePath = (clubId: string, id: string) => `${clubPath(clubId)}/${encodeURIComponent(id)}`;

/** A club's templates; `withRetired` adds retired ones (owners and admins only: members never get them). */
export function useTemplatesQuery(clubId: string, q: string, tag: string, withRetired = false) {
  return useQuery<TemplateSummary[], Error, TemplateSummary[], ReturnType<typeof templateKeys.list>>({
    queryKey: templateKeys.list(clubId, q, tag, withRetired),
    queryFn: ({ signal }) =>
      api.get<{ templates: TemplateSummary[] }>(withQuery(clubPath(clubId), { q: q.trim() || undefined, tag: tag || undefined, retired: withRetired ? '1' : undefined }), signal).then((r) => r.templates),
    staleTime: TEMPLATES_STALE_MS,
    placeholderData: keepPreviousData,
  });
}

export function useTemplateQuery(clubId: string, id: string) {
  return useQuery({
    queryKey: templateKeys.detail(clubId, id),
    queryFn: ({ signal }) => api.get<{ template: TemplateDetail }>(templatePath(clubId, id), signal).then((r) => r.template),
    staleTime: TEMPLATES_STALE_MS,
  });
}

function useInvalidateTemplates() {
  const queryClient = useQueryClient();
  return () => Promise.all([queryClient.invalidateQueries({ queryKey: templateKeys.all }), queryClient.invalidateQueries({ queryKey: clubKeys.all })]);
}

export function usePublishTemplateMutation(clubId: string) {
  const invalidate = useInvalidateTemplates();
  return useMutation({
    mutationFn: (input: TemplatePublish) => api.post<{ template: TemplateSummary }>(clubPath(clubId), input).then((r) => r.template),
    onSettled: invalidate,
  });
}

/** Admin writes on one template: a new version, metadata, retiring. */
export function useTemplateAdminMutations(clubId: string, id: string) {
  const invalidate = useInvalidateTemplates();
  const newVersion = useMutation({
    mutationFn: (input: { recipeId: string; changelog: string }) => api.post<{ template: TemplateSummary }>(`${templatePath(clubId, id)}/versions`, input),
    onSettled: invalidate,
  });
  const edit = useMutation({
    mutationFn: (input: { title?: string; description?: string; tags?: string[] }) => api.patch<{ template: TemplateSummary }>(templatePath(clubId, id), input),
    onSettled: invalidate,
  });
  const retire = useMutation({
    mutationFn: () => api.post<{ template: TemplateSummary }>(`${templatePath(clubId, id)}/retire`, {}),
    onSettled: invalidate,
  });
  return { newVersion, edit, retire };
}

/** The bands a `use` could not map to the chosen rig (400 `unmapped-bands`), else null. */
export function unmappedBandsOf(error: unknown): string[] | null {
  if (!isApiError(error, 400) || error.code !== 'unmapped-bands') return null;
  const body = error.body as { error?: { bands?: unknown } } | undefined;
  const bands = body?.error?.bands;
  return Array.isArray(bands) ? bands.filter((b): b is string => typeof b === 'string') : [];
}

/** True for 409 `template-retired`: the template was retired after the page loaded (e.g. in another tab). */
export function isTemplateRetiredError(error: unknown): boolean {
  return isApiError(error, 409) && error.code === 'template-retired';
}

export function useUseTemplateMutation(clubId: string, id: string) {
  const queryClient = useQueryClient();
  const invalidate = useInvalidateTemplates();
  return useMutation({
    mutationFn: (input: TemplateUse) => api.post<{ recipe: RecipeDetail }>(`${templatePath(clubId, id)}/use`, input).then((r) => r.recipe),
    onSettled: () => Promise.all([invalidate(), queryClient.invalidateQueries({ queryKey: recipeKeys.lists() })]),
  });
}

/** A dry run of the template's tree on my rig and site; nothing is stored. */
export function usePreviewDryRunMutation() {
  return useMutation({
    mutationFn: (input: { tree: RecipeTree; rigId: string; siteId: string; date?: string }) => api.post<{ result: DryRunResult }>('/api/dry-runs', input).then((r) => r.result),
  });
}

/** Which template (and version) a recipe started from; null for recipes of one's own. */
export function useTemplateOriginQuery(recipeId: string) {
  return useQuery({
    queryKey: templateKeys.origin(recipeId),
    queryFn: ({ signal }) => api.get<{ origin: TemplateOrigin | null }>(`/api/recipes/${encodeURIComponent(recipeId)}/template-origin`, signal).then((r) => r.origin),
    staleTime: TEMPLATES_STALE_MS,
    enabled: recipeId.length > 0,
    retry: false,
  });
}

export function useTemplateDiffQuery(recipeId: string, enabled: boolean) {
  return useQuery({
    queryKey: templateKeys.diff(recipeId),
    queryFn: ({ signal }) => api.get<TemplateDiff>(`/api/recipes/${encodeURIComponent(recipeId)}/template-diff`, signal),
    staleTime: TEMPLATES_STALE_MS,
    enabled: enabled && recipeId.length > 0,
  });
}
