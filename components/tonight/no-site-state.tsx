import { router } from 'expo-router';

import { NavIcon } from '@/components/nav/nav-icons';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { useTheme } from '@/components/theme-provider';

/** First run: the night needs a place before it can be worked out. */
export function NoSiteState() {
  const { palette } = useTheme();
  return (
    <EmptyState
      testID="tonight-no-site"
      icon={<NavIcon name="sites" color={palette.accent} size={36} />}
      title="Add your first site"
      message="Nightloom works out each night's twilight, darkness and Moon from where you observe. Add a site with its coordinates and time zone."
      action={<Button label="Add a site" onPress={() => router.push('/sites/new')} testID="tonight-add-site" />}
    />
  );
}
