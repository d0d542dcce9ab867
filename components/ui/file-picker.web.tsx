import { useEffect, useRef, type ChangeEvent } from 'react';

import { Button } from '@/components/ui/button';
import type { FilePickerProps } from '@/components/ui/file-picker-props';

export type { FilePickerProps };

/**
 * A button that opens the browser's file (or, with `directory`, folder) chooser. The real
 * `<input type="file">` stays hidden (and out of the tab order); the button carries the label,
 * focus and pending state.
 */
export function FilePicker({ label, accept, multiple, directory, onFiles, testID, disabled, pending, variant = 'secondary', size = 'regular' }: FilePickerProps) {
  const input = useRef<HTMLInputElement>(null);
  useEffect(() => {
    // Not in React's typed attributes; set on the element so the chooser picks folders.
    const element = input.current;
    if (!element) return;
    for (const name of ['webkitdirectory', 'directory']) {
      if (directory) element.setAttribute(name, '');
      else element.removeAttribute(name);
    }
  }, [directory]);
  const onChange = (event: ChangeEvent<HTMLInputElement>) => {
    const files = Array.from(event.target.files ?? []);
    // Clear so choosing the same file again still fires a change.
    event.target.value = '';
    if (files.length > 0) onFiles(files);
  };
  return (
    <>
      <Button label={label} variant={variant} size={size} disabled={disabled} pending={pending} testID={testID} onPress={() => input.current?.click()} />
      <input
        ref={input}
        type="file"
        accept={directory ? undefined : accept}
        multiple={multiple || directory}
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
