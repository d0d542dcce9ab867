import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/lib/api';

/** Settings change only here; five minutes is fine. */
export const ACCOUNT_SETTINGS_STALE_MS = 5 * 60_000;

export interface AccountSettings {
  /** Mail me when a template I used gets a new version. */
  notifyTemplateVersions: boolean;
}

export const accountSettingsKeys = { all: ['account-settings'] as const };

export function useAccountSettingsQuery() {
  return useQuery({
    queryKey: accountSettingsKeys.all,
    queryFn: ({ signal }) => api.get<{ settings: AccountSettings }>('/api/account/settings', signal).then((r) => r.settings),
    staleTime: ACCOUNT_SETTINGS_STALE_MS,
  });
}

/** One key, so the switch flips at once and rolls back if the server refuses. */
export function useSaveAccountSettingsMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (settings: AccountSettings) => api.put<{ settings: AccountSettings }>('/api/account/settings', settings).then((r) => r.settings),
    onMutate: async (next) => {
      await queryClient.cancelQueries({ queryKey: accountSettingsKeys.all });
      const previous = queryClient.getQueryData<AccountSettings>(accountSettingsKeys.all);
      queryClient.setQueryData(accountSettingsKeys.all, next);
      return { previous };
    },
    onError: (_e, _next, context) => {
      if (context?.previous) queryClient.setQueryData(accountSettingsKeys.all, context.previous);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: accountSettingsKeys.all }),
  });
}
