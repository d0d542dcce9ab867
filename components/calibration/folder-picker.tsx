import { Button } from '@/components/ui/button';
import type { FolderPickerProps } from '@/components/calibration/folder-picker-props';

export type { FolderPickerProps };

/** Native placeholder: picking a folder is offered in the web app for now (see `folder-picker.web.tsx`). */
export function FolderPicker({ label, testID, variant = 'secondary' }: FolderPickerProps) {
  return <Button label={label} variant={variant} disabled testID={testID} accessibilityLabel={`${label} (web app only)`} />;
}
