import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { recipeKeys } from '@/hooks/use-recipes';
import { api } from '@/lib/api';
import type { HistoryTarget, SharedCapture, TargetHistory } from '@/shared/schemas/calibration-api';

/** History grows only by intake from this client (which invalidates); a minute covers another tab. */
export const HISTORY_STALE_MS = 60_000;
/** Other members share and unshare at any time; half a minute is fine for a club page. */
export const CLUB_CAPTURES_STALE_MS = 30_000;

export const historyKeys = {
  all: ['history'] as const,
  list: () => [...historyKeys.all, 'list'] as const,
  target: (id: string) => [...historyKeys.all, 'target', id] as const,
  object: (label: string) => [...historyKeys.all, 'object', label] as const,
  clubCaptures: (clubId: string) => [...historyKeys.all, 'club', clubId] as const,
};

const targetPath = (id: string) => `/api/history/targets/${encodeURIComponent(id)}`;
const objectPath = (label: string) => `/api/history/objects/${encodeURIComponent(label)}`;

/** Every target with recorded lights (and the lights no target matched, by OBJECT). */
export function useHistoryQuery() {
  return useQuery({
    queryKey: historyKeys.list(),
    queryFn: ({ signal }) => api.get<{ targets: HistoryTarget[] }>('/api/history', signal).then((r) => r.targets),
    staleTime: HISTORY_STALE_MS,
  });
}

export function useTargetHistoryQuery(targetId: string) {
  return useQuery({
    queryKey: historyKeys.target(targetId),
    queryFn: ({ signal }) => api.get<TargetHistory>(targetPath(targetId), signal),
    staleTime: HISTORY_STALE_MS,
    enabled: targetId.length > 0,
  });
}

/** The lights no target matched whose OBJECT is `label` (a history row with a null target id). */
export function useObjectHistoryQuery(label: string) {
  return useQuery({
    queryKey: historyKeys.object(label),
    queryFn: ({ signal }) => api.get<TargetHistory>(objectPath(label), signal),
    staleTime: HISTORY_STALE_MS,
    enabled: label.length > 0,
  });
}

export type ContinueRequest = { framingKey: string; positionAngleDeg: number; recipeId?: string; version?: number };

/** "Continue this target": a stage at a recorded framing, in a new recipe or added to one (with its version). */
export function useContinueTargetMutation(targetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: ContinueRequest) => api.post<{ recipeId: string; skippedFilters: string[] }>(`${targetPath(targetId)}/continue`, request),
    onSettled: (_data, _error, request) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: recipeKeys.lists() }),
        request.recipeId ? queryClient.invalidateQueries({ queryKey: recipeKeys.detail(request.recipeId) }) : null,
      ]),
  });
}

/** Shares (or stops sharing) a target's capture summary with one club; nothing is shared unasked. */
export function useCaptureShareMutation(targetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ organizationId, shared }: { organizationId: string; shared: boolean }) =>
      shared
        ? api.post<unknown>(`${targetPath(targetId)}/shares`, { organizationId })
        : api.del(`${targetPath(targetId)}/shares/${encodeURIComponent(organizationId)}`),
    onSettled: () => queryClient.invalidateQueries({ queryKey: historyKeys.all }),
  });
}

/** What the members of a club chose to share of their captures. */
export function useClubCapturesQuery(clubId: string) {
  return useQuery({
    queryKey: historyKeys.clubCaptures(clubId),
    queryFn: ({ signal }) => api.get<{ captures: SharedCapture[] }>(`/api/clubs/${encodeURIComponent(clubId)}/captures`, signal).then((r) => r.captures),
    staleTime: CLUB_CAPTURES_STALE_MS,
    enabled: clubId.length > 0,
  });
}
