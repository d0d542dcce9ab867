import { useState } from 'react';

import { authClient } from '@/lib/auth-client';

/** better-auth's admin plugin may store several roles as a comma list ("admin,user"). */
function isSiteAdmin(role: string | null | undefined): boolean {
  return (role ?? '').split(',').some((r) => r.trim() === 'admin');
}

/**
 * The signed-in user, for gating and display. `isLoading` is true only until the first answer:
 * later refetches (e.g. after a failed sign-in) must not unmount the screen the user is on.
 */
export function useSessionState() {
  const { data, isPending } = authClient.useSession();
  const [settled, setSettled] = useState(false);
  if (!isPending && !settled) setSettled(true);
  const user = data?.user ?? null;
  return {
    session: data ?? null,
    user,
    isAdmin: isSiteAdmin(user?.role),
    isLoading: !settled && isPending,
  };
}
