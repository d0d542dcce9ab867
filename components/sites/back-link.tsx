import { TextLink } from '@/components/ui/text-link';

/** "‹ Sites" above a detail page. */
export function BackToSites() {
  return <TextLink href="/sites" label="‹ Sites" variant="small" testID="back-to-sites" />;
}
