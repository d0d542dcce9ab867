import { useInfiniteQuery, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';

import { historyKeys } from '@/hooks/use-history';
import { recipeKeys } from '@/hooks/use-recipes';
import { api, isApiError, withQuery } from '@/lib/api';
import type { IntakeFile } from '@/lib/fits-intake';
import { sendBody, type UploadProgress } from '@/lib/upload';
import type { BiasLibrarySet, DarkLibrary, DarkLibrarySet, DarkSetInput, DarkToShoot, FlatsPlan, IntakeList, IntakeResult } from '@/shared/schemas/calibration-api';

/** The library changes by our own writes (which invalidate); a minute covers another tab. */
export const CALIBRATION_STALE_MS = 60_000;

export const calibrationKeys = {
  all: ['calibration'] as const,
  darkLibrary: () => [...calibrationKeys.all, 'dark-library'] as const,
  flats: (night: string | null) => [...calibrationKeys.all, 'flats', night ?? 'latest'] as const,
  intakes: () => [...calibrationKeys.all, 'intakes'] as const,
};

/** Imports per page of the "Imports" list. */
export const INTAKES_PAGE_SIZE = 20;

const setPath = (id: string) => `/api/calibration/dark-sets/${encodeURIComponent(id)}`;

/** Everything recorded frames feed: the dark library, flats, capture history and dry runs' darks. */
function useInvalidateCalibration() {
  const queryClient = useQueryClient();
  return () => Promise.all([queryClient.invalidateQueries({ queryKey: calibrationKeys.all }), queryClient.invalidateQueries({ queryKey: historyKeys.all })]);
}

export function useDarkLibraryQuery() {
  return useQuery({
    queryKey: calibrationKeys.darkLibrary(),
    queryFn: ({ signal }) => api.get<DarkLibrary>('/api/calibration/dark-library', signal),
    staleTime: CALIBRATION_STALE_MS,
  });
}

/**
 * Sends the picked files' headers in one request (all or nothing), with upload progress;
 * `progress` is null until the upload starts.
 */
export function useIntakeMutation() {
  const invalidate = useInvalidateCalibration();
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const mutation = useMutation({
    mutationFn: (files: IntakeFile[]) => {
      setProgress({ loadedBytes: 0, totalBytes: 1 });
      return sendBody<IntakeResult>({ url: '/api/calibration/intake', body: JSON.stringify({ files }), contentType: 'application/json', onProgress: setProgress });
    },
    onSettled: invalidate,
  });
  return { ...mutation, progress };
}

/** The user's past imports, newest first, a page at a time ("Show older imports"). */
export function useIntakesQuery() {
  return useInfiniteQuery({
    queryKey: calibrationKeys.intakes(),
    queryFn: ({ pageParam, signal }) => api.get<IntakeList>(withQuery('/api/calibration/intakes', { limit: String(INTAKES_PAGE_SIZE), cursor: pageParam ?? undefined }), signal),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor,
    staleTime: CALIBRATION_STALE_MS,
  });
}

/** Takes back every frame one intake recorded (right after it, or later from the Imports list). */
export function useUndoIntakeMutation() {
  const invalidate = useInvalidateCalibration();
  return useMutation({
    mutationFn: (intakeId: string) => api.del(`/api/calibration/intakes/${encodeURIComponent(intakeId)}`),
    onSettled: invalidate,
  });
}

export function useAddDarkSetMutation() {
  const invalidate = useInvalidateCalibration();
  return useMutation({
    mutationFn: (input: DarkSetInput) => api.post<unknown>('/api/calibration/dark-sets', input),
    onSettled: invalidate,
  });
}

/** True when a save lost to another one (409): the form shows why and the library reloads. */
export const isVersionConflict = (error: unknown) => isApiError(error, 409);

export function useUpdateDarkSetMutation() {
  const invalidate = useInvalidateCalibration();
  return useMutation({
    mutationFn: ({ id, input, version }: { id: string; input: DarkSetInput; version: number }) => api.put<unknown>(setPath(id), { ...input, version }),
    onSettled: invalidate,
  });
}

/** Deletes a set entered by hand, or (id `intake:<key>`) the recorded dark frames behind a set. */
export function useDeleteDarkSetMutation() {
  const invalidate = useInvalidateCalibration();
  return useMutation({
    mutationFn: (set: Pick<DarkLibrarySet, 'id' | 'source'>) =>
      set.source === 'intake'
        ? api.del(`/api/calibration/dark-library/intake/${encodeURIComponent(set.id.replace(/^intake:/, ''))}`)
        : api.del(setPath(set.id)),
    onSettled: invalidate,
  });
}

/** Forgets the recorded bias frames behind a bias set (id `bias:<key>`). */
export function useDeleteBiasSetMutation() {
  const invalidate = useInvalidateCalibration();
  return useMutation({
    mutationFn: (set: Pick<BiasLibrarySet, 'id'>) => api.del(`/api/calibration/dark-library/bias/${encodeURIComponent(set.id.replace(/^bias:/, ''))}`),
    onSettled: invalidate,
  });
}

export function useDarkValidityMutation() {
  const invalidate = useInvalidateCalibration();
  return useMutation({
    mutationFn: (darkValidityMonths: number) => api.put<unknown>('/api/calibration/settings', { darkValidityMonths }),
    onSettled: invalidate,
  });
}

/** A new recipe for a cloudy night that shoots the given dark sets. */
export function useDarksRecipeMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: { darks: DarkToShoot[]; rigId?: string | null; count?: number; name?: string }) =>
      api.post<{ recipeId: string }>('/api/calibration/darks-recipe', request).then((r) => r.recipeId),
    onSettled: () => queryClient.invalidateQueries({ queryKey: recipeKeys.lists() }),
  });
}

/** A night's (filter, rotator angle, focus) combinations and the flats on record; null night: the latest with lights. */
export function useFlatsPlanQuery(night: string | null) {
  return useQuery({
    queryKey: calibrationKeys.flats(night),
    queryFn: ({ signal }) => api.get<FlatsPlan>(withQuery('/api/calibration/flats', { night: night ?? undefined }), signal),
    staleTime: CALIBRATION_STALE_MS,
  });
}

export function useFlatsRecipeMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: { nightDate: string; source: 'panel' | 'sky'; rigId?: string | null; count?: number }) =>
      api.post<{ recipeId: string }>('/api/calibration/flats-recipe', request).then((r) => r.recipeId),
    onSettled: () => queryClient.invalidateQueries({ queryKey: recipeKeys.lists() }),
  });
}
