import { useEffect, useRef, type ChangeEvent } from 'react';

import { Button } from '@/components/ui/button';
import type { FolderPickerProps } from '@/components/calibration/folder-picker-props';

export type { FolderPickerProps };

/**
 * A button that opens the browser's folder chooser: a hidden `<input type="file" webkitdirectory>`
 * hands over every file under the folder (with its path in `webkitRelativePath`).
 */
export function FolderPicker({ label, onFiles, testID, disabled, pending, variant = 'secondary' }: FolderPickerProps) {
  const input = useRef<HTMLInputElement>(null);
  useEffect(() => {
    // Not in React's typed attributes; set on the element so the chooser picks folders.
    input.current?.setAttribute('webkitdirectory', '');
    input.current?.setAttribute('directory', '');
  }, []);
  const onChange = (event: ChangeEvent<HTMLInputElement>) => {
    const files = Array.from(event.target.files ?? []);
    event.target.value = '';
    if (files.length > 0) onFiles(files);
  };
  return (
    <>
      <Button label={label} variant={variant} disabled={disabled} pending={pending} testID={testID} onPress={() => input.current?.click()} />
      <input
        ref={input}
        type="file"
        multiple
        disabled={disabled}
        onChange={onChange}
        data-testid={testID ? `${testID}-input` : undefined}
        aria-hidden
        tabIndex={-1}
        style={{ display: 'none' }}
      />
    </>
  );
}
