import { ChoiceGroup } from '@/components/ui/choice-group';
import type { SelectFieldProps } from '@/components/ui/select-field-props';

/** Native: a pick-one list shows as chips (the web uses the browser's own `<select>`). */
export function SelectField<T extends string>({ compact, ...props }: SelectFieldProps<T>) {
  return <ChoiceGroup {...props} hideLabel={compact} />;
}
