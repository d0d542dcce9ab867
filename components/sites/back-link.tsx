import { BackToSetup } from '@/components/setup/back-to-setup';

/** "‹ Rig & site" above a site's page (sites are listed there, beside the rigs). */
export function BackToSites() {
  return <BackToSetup testID="back-to-sites" />;
}
