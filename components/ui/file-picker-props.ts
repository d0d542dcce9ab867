/** The shared props of `FilePicker` (web: a hidden file or folder input; native: not offered yet). */
export type FilePickerProps = {
  /** Visible button label, also its accessible name. */
  label: string;
  /** The input's `accept`, e.g. ".csv,text/csv". */
  accept?: string;
  multiple?: boolean;
  /** Choose a folder instead: `onFiles` gets every file under it (web: `webkitdirectory`, each file's path in `webkitRelativePath`). */
  directory?: boolean;
  /** Called with the chosen files (never with an empty list). */
  onFiles: (files: File[]) => void;
  /** Goes on the button; the hidden input gets `${testID}-input` (for `page.setInputFiles`). */
  testID?: string;
  disabled?: boolean;
  pending?: boolean;
  variant?: 'primary' | 'secondary' | 'ghost';
  size?: 'regular' | 'small';
};
