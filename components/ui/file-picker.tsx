import { Button } from '@/components/ui/button';
import type { FilePickerProps } from '@/components/ui/file-picker-props';

export type { FilePickerProps };

/**
 * Native placeholder: choosing files is offered in the web app for now (the web version lives in
 * `file-picker.web.tsx`). Shown disabled so screens keep one layout on every platform.
 */
export function FilePicker({ label, testID, variant = 'secondary', size = 'regular' }: FilePickerProps) {
  return <Button label={label} variant={variant} size={size} disabled testID={testID} accessibilityLabel={`${label} (web app only)`} />;
}
