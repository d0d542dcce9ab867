import { useQueryClient } from '@tanstack/react-query';
import { Stack } from 'expo-router';
import { useEffect, useRef } from 'react';

import { SplashView } from '@/components/splash-view';
import { useTheme } from '@/components/theme-provider';
import { useSessionState } from '@/hooks/use-session';

/**
 * Declarative gating: `(app)` exists only with a session and `(auth)` only without one, so
 * signing in or out moves the user without any imperative redirects. `reset-password` is
 * open to both, since the e-mailed link may be opened where someone is signed in.
 */
/**
 * Cached data belongs to one user: drop it when a signed-in user goes away (sign-out, expiry,
 * another account). Not on signing in: the new user's first queries are already in flight then,
 * and clearing would cancel them.
 */
function useClearCacheOnUserChange(userId: string | null) {
  const queryClient = useQueryClient();
  const previous = useRef(userId);
  useEffect(() => {
    if (previous.current !== null && previous.current !== userId) queryClient.clear();
    previous.current = userId;
  }, [userId, queryClient]);
}

export function RootNavigator({ fontsReady }: { fontsReady: boolean }) {
  const { session, user, isLoading } = useSessionState();
  useClearCacheOnUserChange(user?.id ?? null);
  const { palette } = useTheme();
  // Mount the navigator only once the session is known, so a deep link is not bounced to sign-in.
  if (isLoading || !fontsReady) return <SplashView />;
  return (
    <Stack screenOptions={{ headerShown: false, animation: 'none', contentStyle: { backgroundColor: palette.background } }}>
      <Stack.Protected guard={!!session}>
        <Stack.Screen name="(app)" />
      </Stack.Protected>
      <Stack.Protected guard={!session}>
        <Stack.Screen name="(auth)" />
      </Stack.Protected>
      <Stack.Screen name="reset-password" />
      <Stack.Screen name="invitations/[id]" />
      <Stack.Screen name="+not-found" />
    </Stack>
  );
}
