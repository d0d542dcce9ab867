import { useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api';

export type SentMail = {
  id: string;
  to: string[];
  from: string;
  subject: string;
  text: string;
  html: string;
  receivedAt: string;
};

/** Sent mail arrives asynchronously, so the list polls while it is open. */
export const DEV_MAIL_STALE_MS = 0;
export const DEV_MAIL_POLL_MS = 5_000;

export const devMailKeys = {
  all: ['dev-mail'] as const,
  list: () => [...devMailKeys.all, 'list'] as const,
};

export function useDevMailQuery(enabled: boolean) {
  return useQuery({
    queryKey: devMailKeys.list(),
    queryFn: ({ signal }) => api.get<{ messages: SentMail[] }>('/api/dev/mail', signal).then((r) => r.messages),
    staleTime: DEV_MAIL_STALE_MS,
    refetchInterval: DEV_MAIL_POLL_MS,
    enabled,
  });
}
