import { clearedPatch, hasAnyFilter } from '../../lib/list-params';
import type { ChangeEvent, ComponentProps } from 'react';
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

type FilterValues<K extends string> = Partial<Record<K, string | number | undefined>>;
type FilterPatch<K extends string> = Partial<Record<K, string | undefined>>;

/**
 * Ties a register's filters, as read from the URL, to the fields that show and change them, so each field
 * names its filter once.
 */
export function filterBinding<K extends string>(filters: FilterValues<K>, onChange: (patch: FilterPatch<K>) => void) {
  const set = (key: K, value: string | undefined) => onChange({ [key]: value } as FilterPatch<K>);
  return {
    /** A drop-down or date box: the filter changes as soon as the field does. */
    value: (key: K) => ({ value: filters[key], onChange: (value: string | undefined) => set(key, value) }),
    /** The SearchForm holding the text boxes of these keys. */
    search: <N extends K>(names: readonly N[]) => ({
      names,
      values: filters as FilterValues<N>,
      onSearch: onChange as (patch: FilterPatch<N>) => void,
    }),
    /** A text box inside a SearchForm: read when the search is sent. */
    text: (key: K) => ({ name: key, defaultValue: filters[key] ?? '' }),
    /** A tick box kept in the URL as "true". */
    flag: (key: K) => ({
      checked: filters[key] === 'true',
      onChange: (e: ChangeEvent<HTMLInputElement>) => set(key, e.target.checked ? 'true' : undefined),
    }),
    /** The "Clear filters" button: shown while any of the keys is set. */
    clear: (keys: readonly K[]) => ({
      shown: hasAnyFilter(filters, keys),
      onClear: () => onChange(clearedPatch(keys)),
    }),
  };
}

/** The free-text box of a SearchForm; it takes the room the other boxes leave. */
export function SearchText({
  label = 'Search',
  ...props
}: Omit<ComponentProps<typeof TextInput>, 'label'> & { label?: string }) {
  return <TextInput label={label} type="search" className="flex-1" {...props} />;
}
