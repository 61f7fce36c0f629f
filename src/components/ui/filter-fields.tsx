import { Select, type SelectOption } from './select';
import { TextInput } from './text-input';

interface FilterFieldProps {
  label: string;
  value: string | number | undefined;
  /** An emptied field clears its filter. */
  onChange: (value: string | undefined) => void;
  className?: string;
}

export function DateFilter({ label, value, onChange, className }: FilterFieldProps) {
  return (
    <TextInput
      label={label}
      type="date"
      value={value ?? ''}
      onChange={(e) => onChange(e.target.value || undefined)}
      className={className}
    />
  );
}

export function SelectFilter({ options, ...props }: FilterFieldProps & { options: readonly SelectOption[] }) {
  const { label, value, onChange, className } = props;
  return (
    <Select
      label={label}
      value={value === undefined ? '' : String(value)}
      options={options}
      onChange={(e) => onChange(e.target.value || undefined)}
      className={className}
    />
  );
}
