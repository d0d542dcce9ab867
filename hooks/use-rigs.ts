import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api, isApiError } from '@/lib/api';
import type { Rig, RigInput, RigUpdate } from '@/shared/rig/schema';

/** Rigs change rarely and only through this client, which invalidates on every write. */
export const RIGS_STALE_MS = 5 * 60_000;

export const rigKeys = {
  all: ['rigs'] as const,
  list: () => [...rigKeys.all, 'list'] as const,
  detail: (id: string) => [...rigKeys.all, 'detail', id] as const,
};

export function useRigsQuery() {
  return useQuery({
    queryKey: rigKeys.list(),
    queryFn: ({ signal }) => api.get<{ rigs: Rig[] }>('/api/rigs', signal).then((r) => r.rigs),
    staleTime: RIGS_STALE_MS,
  });
}

export function useRigQuery(id: string) {
  return useQuery({
    queryKey: rigKeys.detail(id),
    queryFn: ({ signal }) => api.get<{ rig: Rig }>(`/api/rigs/${encodeURIComponent(id)}`, signal).then((r) => r.rig),
    staleTime: RIGS_STALE_MS,
    enabled: id.length > 0,
  });
}

function useInvalidateRigs() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: rigKeys.all });
}

export function useCreateRigMutation() {
  const invalidate = useInvalidateRigs();
  return useMutation({
    mutationFn: (input: RigInput) => api.post<{ rig: Rig }>('/api/rigs', input).then((r) => r.rig),
    onSettled: invalidate,
  });
}

/** The stored rig a 409 answer carries, if the error is a version conflict. */
export function rigConflictOf(error: unknown): Rig | null {
  if (!isApiError(error, 409)) return null;
  const body = error.body as { error?: { current?: Rig }; current?: Rig } | undefined;
  return body?.error?.current ?? body?.current ?? null;
}

/**
 * Saves a rig guarded by its version. On a 409 the mutation exposes `conflict` (the version
 * stored on the server) so the editor can offer to load it or to overwrite it.
 */
export function useUpdateRigMutation(id: string) {
  const invalidate = useInvalidateRigs();
  const mutation = useMutation({
    mutationFn: (update: RigUpdate) => api.put<{ rig: Rig }>(`/api/rigs/${encodeURIComponent(id)}`, update).then((r) => r.rig),
    onSettled: invalidate,
  });
  return { ...mutation, conflict: rigConflictOf(mutation.error) };
}

export function useDeleteRigMutation() {
  const queryClient = useQueryClient();
  const invalidate = useInvalidateRigs();
  return useMutation({
    mutationFn: (id: string) => api.del(`/api/rigs/${encodeURIComponent(id)}`),
    onSuccess: (_data, id) => queryClient.removeQueries({ queryKey: rigKeys.detail(id) }),
    onSettled: invalidate,
  });
}
