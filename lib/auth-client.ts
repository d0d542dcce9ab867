import { adminClient, organizationClient } from 'better-auth/client/plugins';
import { createAuthClient } from 'better-auth/react';

/** The web app is served by the API server, so the auth endpoints share its origin. */
const origin = typeof window === 'undefined' ? 'http://localhost' : window.location.origin;

export const authClient = createAuthClient({
  baseURL: origin,
  plugins: [organizationClient(), adminClient()],
});

/** Minimum password length; the server enforces the same. */
export const MIN_PASSWORD_LENGTH = 8;

/** Where the e-mailed reset link lands. */
export function resetPasswordRedirectUrl(): string {
  return `${origin}/reset-password`;
}

/** Ask better-auth to re-read the session, e.g. after an API call answered 401. */
export function refreshSession(): void {
  authClient.$store.notify('$sessionSignal');
}

/** A `next` parameter to return to after signing in or up: same-site paths only. */
export function nextPathOf(next: string | string[] | undefined): string | null {
  const value = Array.isArray(next) ? next[0] : next;
  return value && value.startsWith('/') && !value.startsWith('//') ? value : null;
}
