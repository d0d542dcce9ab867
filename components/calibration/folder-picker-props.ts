/** The shared props of `FolderPicker` (web: a hidden folder input; native: not offered yet). */
export type FolderPickerProps = {
  label: string;
  /** Every file under the chosen folder (never an empty list). */
  onFiles: (files: File[]) => void;
  /** Goes on the button; the hidden input gets `${testID}-input` (for `page.setInputFiles`). */
  testID?: string;
  disabled?: boolean;
  pending?: boolean;
  variant?: 'primary' | 'secondary' | 'ghost';
};
