import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api, isApiError, withQuery } from '@/lib/api';
import type { RecipeCreate, RecipeDetail, RecipeListItem, RecipeRevisionSummary, RecipeSave } from '@/shared/schemas/recipe-api';

/** The list changes through this client (invalidated on writes) or another tab; a minute is fine. */
export const RECIPES_STALE_MS = 60_000;
/** The composer holds the open recipe itself and fetches a fresh copy on every open. */
export const RECIPE_STALE_MS = 0;
/** Revisions only grow by our own saves, which invalidate them. */
export const REVISIONS_STALE_MS = 30_000;

export type RecipeSort = 'updated' | 'name' | 'exposure';
export interface RecipeListParams {
  q: string;
  sort: RecipeSort;
}

export const recipeKeys = {
  all: ['recipes'] as const,
  lists: () => [...recipeKeys.all, 'list'] as const,
  list: (params: RecipeListParams) => [...recipeKeys.lists(), params] as const,
  detail: (id: string) => [...recipeKeys.all, 'detail', id] as const,
  revisions: (id: string) => [...recipeKeys.all, 'revisions', id] as const,
  revision: (id: string, version: number) => [...recipeKeys.all, 'revision', id, version] as const,
};

const recipePath = (id: string) => `/api/recipes/${encodeURIComponent(id)}`;

export function useRecipesQuery(params: RecipeListParams) {
  return useQuery<RecipeListItem[], Error, RecipeListItem[], ReturnType<typeof recipeKeys.list>>({
    queryKey: recipeKeys.list(params),
    queryFn: ({ signal }) => api.get<{ recipes: RecipeListItem[] }>(withQuery('/api/recipes', { q: params.q.trim() || undefined, sort: params.sort }), signal).then((r) => r.recipes),
    staleTime: RECIPES_STALE_MS,
    // Typing in the search box keeps the last rows on screen instead of flashing a spinner.
    placeholderData: keepPreviousData,
  });
}

export function useRecipeQuery(id: string) {
  return useQuery({
    queryKey: recipeKeys.detail(id),
    queryFn: ({ signal }) => api.get<{ recipe: RecipeDetail }>(recipePath(id), signal).then((r) => r.recipe),
    staleTime: RECIPE_STALE_MS,
    refetchOnMount: 'always',
    // The composer never swaps its copy under the user; a conflict on save tells them instead.
    refetchOnWindowFocus: false,
    enabled: id.length > 0,
  });
}

export function useRecipeRevisionsQuery(id: string, enabled: boolean) {
  return useQuery({
    queryKey: recipeKeys.revisions(id),
    queryFn: ({ signal }) => api.get<{ revisions: RecipeRevisionSummary[] }>(`${recipePath(id)}/revisions`, signal).then((r) => r.revisions),
    staleTime: REVISIONS_STALE_MS,
    enabled: enabled && id.length > 0,
  });
}

function useInvalidateLists() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: recipeKeys.lists() });
}

export function useCreateRecipeMutation() {
  const invalidate = useInvalidateLists();
  return useMutation({
    mutationFn: (input: RecipeCreate) => api.post<{ recipe: RecipeDetail }>('/api/recipes', input).then((r) => r.recipe),
    onSettled: invalidate,
  });
}

/** One save of the whole recipe, guarded by its version (the composer's autosave calls it). */
export function saveRecipe(id: string, save: RecipeSave): Promise<RecipeDetail> {
  return api.put<{ recipe: RecipeDetail }>(recipePath(id), save).then((r) => r.recipe);
}

/** The stored recipe a 409 `version-conflict` answer carries. */
export function recipeConflictOf(error: unknown): RecipeDetail | null {
  if (!isApiError(error, 409) || error.code !== 'version-conflict') return null;
  const body = error.body as { error?: { current?: RecipeDetail } } | undefined;
  return body?.error?.current ?? null;
}

/** Soft delete; `useRestoreRecipeMutation` undoes it. */
export function useDeleteRecipeMutation() {
  const invalidate = useInvalidateLists();
  return useMutation({
    mutationFn: (id: string) => api.del<{ recipe: RecipeDetail }>(recipePath(id)).then((r) => r.recipe),
    onSettled: invalidate,
  });
}

export function useRestoreRecipeMutation() {
  const invalidate = useInvalidateLists();
  return useMutation({
    mutationFn: (id: string) => api.post<{ recipe: RecipeDetail }>(`${recipePath(id)}/restore`, {}).then((r) => r.recipe),
    onSettled: invalidate,
  });
}

/** Writes an old revision back as a new version; `version` is the one the composer holds. */
export function useRestoreRevisionMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ revision, version }: { revision: number; version: number }) =>
      api.post<{ recipe: RecipeDetail }>(`${recipePath(id)}/revisions/${revision}/restore`, { version }).then((r) => r.recipe),
    onSettled: () => Promise.all([queryClient.invalidateQueries({ queryKey: recipeKeys.revisions(id) }), queryClient.invalidateQueries({ queryKey: recipeKeys.lists() })]),
  });
}
