import { Link, type Href } from 'expo-router';

import { AppText } from '@/components/ui/app-text';
import type { TypeVariant } from '@/constants/theme';

type TextLinkProps = { href: Href; label: string; testID?: string; variant?: TypeVariant };

/** An in-app link styled as accent text (an `<a href>` on the web). */
export function TextLink({ href, label, testID, variant = 'body' }: TextLinkProps) {
  return (
    <Link href={href} asChild>
      <AppText variant={variant} tone="accent" weight="semibold" testID={testID} role="link">
        {label}
      </AppText>
    </Link>
  );
}
