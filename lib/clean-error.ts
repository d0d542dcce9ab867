import { ApiError } from '@/lib/api';

const byStatus: Record<number, string> = {
  0: 'Could not reach the Nightloom server. Check the connection and try again.',
  401: 'Your session has ended. Sign in again.',
  403: 'You do not have access to this.',
  404: 'That could not be found. It may have been deleted.',
  409: 'This was changed elsewhere in the meantime.',
  429: 'Too many attempts. Wait a minute and try again.',
};

function sentence(text: string): string {
  const trimmed = text.trim();
  if (!trimmed) return 'Something went wrong.';
  const capital = trimmed.charAt(0).toUpperCase() + trimmed.slice(1);
  return /[.!?]$/.test(capital) ? capital : `${capital}.`;
}

/** Turns anything thrown (API errors, better-auth errors, plain errors) into one readable sentence. */
export function cleanError(e: unknown): string {
  if (e instanceof ApiError) {
    if (e.status >= 500) return 'The server ran into a problem. Try again in a moment.';
    if (e.status === 0 || e.status === 429) return byStatus[e.status] ?? sentence(e.message);
    if (e.message && !e.message.startsWith('The server answered')) return sentence(e.message);
    return byStatus[e.status] ?? sentence(e.message);
  }
  if (e && typeof e === 'object' && 'message' in e && typeof e.message === 'string' && e.message) {
    return sentence(e.message);
  }
  if (typeof e === 'string') return sentence(e);
  return 'Something went wrong.';
}
