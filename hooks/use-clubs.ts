import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api, ApiError } from '@/lib/api';
import { authClient } from '@/lib/auth-client';
import type { ClubDetail as ApiClubDetail, ClubInvitation, ClubListItem, ClubMember as ApiClubMember, InvitationPreview, TemplateSummary } from '@/shared/schemas/club-api';

/** Club lists change by our own writes (which invalidate) or another member's; half a minute is fine. */
export const CLUBS_STALE_MS = 30_000;

export type ClubRole = 'owner' | 'admin' | 'member';
export const CLUB_ROLES: readonly ClubRole[] = ['member', 'admin', 'owner'];

export type ClubSummary = ClubListItem;
/** better-auth's member row id is looked up when our club API does not send it. */
export type ClubMember = ApiClubMember;
export type { ClubInvitation, InvitationPreview, TemplateSummary };
export interface ClubDetail extends Omit<ApiClubDetail, 'members'> {
  members: ClubMember[];
}

export const clubKeys = {
  all: ['clubs'] as const,
  list: () => [...clubKeys.all, 'list'] as const,
  detail: (id: string) => [...clubKeys.all, 'detail', id] as const,
  invitation: (id: string) => ['invitations', id] as const,
  invitationPreview: (id: string) => ['invitations', id, 'preview'] as const,
};

/** Owners and admins manage invitations and templates. */
export const canManageClub = (roles: readonly string[]) => roles.includes('owner') || roles.includes('admin');
export const isClubOwner = (roles: readonly string[]) => roles.includes('owner');

type AuthResult<T> = { data: T | null; error: { message?: string; status: number; code?: string } | null };

/** better-auth answers `{ data, error }`; screens want a throw like the API client's. */
export async function unwrapAuth<T>(call: Promise<AuthResult<T>>): Promise<T> {
  const { data, error } = await call;
  if (error) throw new ApiError(error.status, error.code ?? `http-${error.status}`, error.message ?? `The server answered ${error.status}.`, undefined, error);
  return data as T;
}

export function useClubsQuery() {
  return useQuery({
    queryKey: clubKeys.list(),
    queryFn: ({ signal }) => api.get<{ clubs: ClubSummary[] }>('/api/clubs', signal).then((r) => r.clubs),
    staleTime: CLUBS_STALE_MS,
  });
}

export function useClubQuery(id: string) {
  return useQuery({
    queryKey: clubKeys.detail(id),
    queryFn: ({ signal }) => api.get<ClubDetail>(`/api/clubs/${encodeURIComponent(id)}`, signal),
    staleTime: CLUBS_STALE_MS,
    enabled: id.length > 0,
  });
}

function useInvalidateClubs() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: clubKeys.all });
}

/** A URL-safe slug from a club name ("Larch Ridge Imagers" → "larch-ridge-imagers"). */
export function slugOf(name: string): string {
  return name
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 48);
}

export function useCreateClubMutation() {
  const invalidate = useInvalidateClubs();
  return useMutation({
    mutationFn: (input: { name: string; slug: string }) => unwrapAuth(authClient.organization.create(input)),
    onSettled: invalidate,
  });
}

/** Every change to a club's people goes through better-auth, then the club page reloads. */
export function useClubPeopleMutations(clubId: string) {
  const invalidate = useInvalidateClubs();
  const organizationId = clubId;
  const invite = useMutation({
    mutationFn: (input: { email: string; role: ClubRole }) => unwrapAuth(authClient.organization.inviteMember({ ...input, organizationId })),
    onSettled: invalidate,
  });
  // Its own mutation, so a resend's outcome shows by the invitations and not under the invite form.
  const resend = useMutation({
    mutationFn: (input: { email: string; role: ClubRole }) => unwrapAuth(authClient.organization.inviteMember({ ...input, organizationId, resend: true })),
    onSettled: invalidate,
  });
  const revoke = useMutation({
    mutationFn: (invitationId: string) => unwrapAuth(authClient.organization.cancelInvitation({ invitationId })),
    onSettled: invalidate,
  });
  const changeRole = useMutation({
    mutationFn: ({ member, role }: { member: ClubMember; role: ClubRole }) => unwrapAuth(authClient.organization.updateMemberRole({ memberId: member.memberId, role, organizationId })),
    onSettled: invalidate,
  });
  const remove = useMutation({
    mutationFn: (member: ClubMember) => unwrapAuth(authClient.organization.removeMember({ memberIdOrEmail: member.memberId, organizationId })),
    onSettled: invalidate,
  });
  const leave = useMutation({
    mutationFn: () => unwrapAuth(authClient.organization.leave({ organizationId })),
    onSettled: invalidate,
  });
  return { invite, resend, revoke, changeRole, remove, leave };
}

export interface InvitationView {
  id: string;
  email: string;
  role: string;
  status: string;
  organizationId: string;
  organizationName: string;
  inviterEmail: string;
}

/** An invitation as better-auth shows it to the invited (signed-in) person. */
export function useInvitationQuery(id: string, enabled: boolean) {
  return useQuery({
    queryKey: clubKeys.invitation(id),
    queryFn: () => unwrapAuth(authClient.organization.getInvitation({ query: { id } })).then((r) => r as unknown as InvitationView),
    enabled: enabled && id.length > 0,
    retry: false,
  });
}

/** What a signed-out visitor may see of an invitation: club, inviter, role, masked address. */
export function useInvitationPreviewQuery(id: string, enabled: boolean) {
  return useQuery({
    queryKey: clubKeys.invitationPreview(id),
    queryFn: ({ signal }) => api.get<InvitationPreview>(`/api/invitations/${encodeURIComponent(id)}/preview`, signal),
    enabled: enabled && id.length > 0,
  });
}

export function useAcceptInvitationMutation() {
  const invalidate = useInvalidateClubs();
  return useMutation({
    mutationFn: (invitationId: string) => unwrapAuth(authClient.organization.acceptInvitation({ invitationId })),
    onSettled: invalidate,
  });
}
