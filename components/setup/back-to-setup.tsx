import { TextLink } from '@/components/ui/text-link';

/** "‹ Rig & site" above a rig's or a site's page. */
export function BackToSetup({ testID = 'back-to-setup' }: { testID?: string }) {
  return <TextLink href="/setup" label="‹ Rig & site" variant="small" testID={testID} />;
}
