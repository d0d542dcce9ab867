import type { Choice } from '@/components/ui/choice-group';

/** The shared props of `SelectField` (web: a native `<select>`; native: chips). */
export type SelectFieldProps<T extends string> = {
  label: string;
  choices: readonly Choice<T>[];
  value: T;
  onChange: (next: T) => void;
  error?: string;
  testID?: string;
  /** In a table row: no visible label (the column header names it) and a shorter box. */
  compact?: boolean;
};
