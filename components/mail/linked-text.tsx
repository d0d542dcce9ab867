import type { ReactElement } from 'react';
import { Text, type TextProps } from 'react-native';

import { AppText } from '@/components/ui/app-text';

const URL_PATTERN = /(https?:\/\/[^\s<>"]+[^\s<>".,;:!?)\]])/g;

/** react-native-web renders a Text with `href` as a real `<a>`; React Native's types do not know it. */
type WebAnchorProps = TextProps & { href: string; hrefAttrs?: { target?: string; rel?: string } };
const Anchor = Text as unknown as (props: WebAnchorProps) => ReactElement;

function isSameOrigin(url: string): boolean {
  if (typeof window === 'undefined') return false;
  try {
    return new URL(url).origin === window.location.origin;
  } catch {
    return false;
  }
}

/**
 * Plain text with its URLs as working links. Links into this app open in the same tab (the reset
 * link goes through the auth server first, so it must be a real page load, not an in-app push).
 */
export function LinkedText({ text, testID }: { text: string; testID?: string }) {
  const parts = text.split(URL_PATTERN);
  return (
    <AppText variant="small" tone="muted" selectable testID={testID}>
      {parts.map((part, i) =>
        i % 2 === 1 ? (
          <Anchor
            key={`${i}-${part}`}
            href={part}
            hrefAttrs={isSameOrigin(part) ? undefined : { target: '_blank', rel: 'noopener noreferrer' }}
            role="link"
          >
            <AppText variant="small" tone="accent" style={linkStyle}>
              {part}
            </AppText>
          </Anchor>
        ) : (
          part
        ),
      )}
    </AppText>
  );
}

const linkStyle = { textDecorationLine: 'underline' } as const;
