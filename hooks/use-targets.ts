import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { historyKeys } from '@/hooks/use-history';
import { api, isApiError } from '@/lib/api';
import { bytesBlob, sendBody } from '@/lib/upload';
import type { Framing, FramingInput, Target, TargetInput } from '@/shared/schemas/target';

/** The target list changes only through this client, which invalidates on every write. */
export const TARGETS_STALE_MS = 2 * 60_000;

export const targetKeys = {
  all: ['targets'] as const,
  list: () => [...targetKeys.all, 'list'] as const,
  detail: (id: string) => [...targetKeys.all, 'detail', id] as const,
};

const targetPath = (id: string) => `/api/targets/${encodeURIComponent(id)}`;
const framingPath = (targetId: string, framingId: string) => `${targetPath(targetId)}/framings/${encodeURIComponent(framingId)}`;

export function useTargetsQuery() {
  return useQuery({
    queryKey: targetKeys.list(),
    queryFn: ({ signal }) => api.get<{ targets: Target[] }>('/api/targets', signal).then((r) => r.targets),
    staleTime: TARGETS_STALE_MS,
  });
}

export function useTargetQuery(id: string) {
  return useQuery({
    queryKey: targetKeys.detail(id),
    queryFn: ({ signal }) => api.get<{ target: Target }>(targetPath(id), signal).then((r) => r.target),
    staleTime: TARGETS_STALE_MS,
    enabled: id.length > 0,
  });
}

/** Capture history links lights to targets and framings when read, so it changes with the list. */
function useInvalidateTargets() {
  const queryClient = useQueryClient();
  return () => Promise.all([queryClient.invalidateQueries({ queryKey: targetKeys.all }), queryClient.invalidateQueries({ queryKey: historyKeys.all })]);
}

export function useAddTargetMutation() {
  const invalidate = useInvalidateTargets();
  return useMutation({
    mutationFn: (input: TargetInput) => api.post<{ target: Target }>('/api/targets', input).then((r) => r.target),
    onSettled: invalidate,
  });
}

/** The stored copy a 409 version-conflict answer carries. */
export function conflictOf<T>(error: unknown): T | null {
  if (!isApiError(error, 409) || error.code !== 'version-conflict') return null;
  const body = error.body as { error?: { current?: T } } | undefined;
  return body?.error?.current ?? null;
}

/** Saves the target's fields (notes included) guarded by its version; `conflict` holds theirs on a 409. */
export function useUpdateTargetMutation(id: string) {
  const invalidate = useInvalidateTargets();
  const mutation = useMutation({
    mutationFn: (update: TargetInput & { version: number }) => api.put<{ target: Target }>(targetPath(id), update).then((r) => r.target),
    onSettled: invalidate,
  });
  return { ...mutation, conflict: conflictOf<Target>(mutation.error) };
}

export function useDeleteTargetMutation() {
  const queryClient = useQueryClient();
  const invalidate = useInvalidateTargets();
  return useMutation({
    mutationFn: (id: string) => api.del(targetPath(id)),
    onSuccess: (_data, id) => queryClient.removeQueries({ queryKey: targetKeys.detail(id) }),
    onSettled: invalidate,
  });
}

export type FramingSave = { input: FramingInput; framingId?: string; version?: number };

/** Creates a framing, or updates one when `framingId` and `version` are given; `conflict` on a 409. */
export function useSaveFramingMutation(targetId: string) {
  const invalidate = useInvalidateTargets();
  const mutation = useMutation({
    mutationFn: ({ input, framingId, version }: FramingSave) =>
      framingId
        ? api.put<{ framing: Framing }>(framingPath(targetId, framingId), { ...input, version }).then((r) => r.framing)
        : api.post<{ framing: Framing }>(`${targetPath(targetId)}/framings`, input).then((r) => r.framing),
    onSettled: invalidate,
  });
  return { ...mutation, conflict: conflictOf<Framing>(mutation.error) };
}

export function useDeleteFramingMutation(targetId: string) {
  const invalidate = useInvalidateTargets();
  return useMutation({
    mutationFn: (framingId: string) => api.del(framingPath(targetId, framingId)),
    onSettled: invalidate,
  });
}

/** What the server read from a FITS header: the WCS framing and the camera's keywords. */
export type FitsFramingResult = {
  framing: { raDeg: number; decDeg: number; positionAngleDeg: number; pixelScaleArcsecPerPx: number; mirrored: boolean };
  frame: { object?: string | null; filter?: string | null; exposureS?: number | null; dateObs?: string | null; dateObsUtc?: string | null; [key: string]: unknown };
};

/** Posts only the header bytes of a FITS file (read with `readFitsHeaderBytes`) to be read on the server. */
export function useFitsFramingMutation() {
  return useMutation({
    mutationFn: (headerBytes: Uint8Array) =>
      sendBody<FitsFramingResult>({ url: '/api/fits/framing', body: bytesBlob(headerBytes), contentType: 'application/octet-stream' }),
  });
}
