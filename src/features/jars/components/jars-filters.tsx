import { jarStatuses } from '../../../../shared/enums';
import { ClearFilters, FilterBar, SearchForm } from '../../../components/ui/filter-bar';
import { DateFilter, SelectFilter } from '../../../components/ui/filter-fields';
import { TextInput } from '../../../components/ui/text-input';
import { clearedPatch, hasAnyFilter } from '../../../lib/list-params';
import type { JarListFilters } from '../api/jars-queries';
import { jarStatusLabels } from './jar-status-badge';

const filterKeys = [
  'q',
  'status',
  'room',
  'shelf',
  'from',
  'to',
  'sessionId',
  'cookRunId',
  'cultureId',
  'grainId',
] as const;
type FilterKey = (typeof filterKeys)[number];

interface JarsFiltersProps {
  filters: JarListFilters;
  onChange: (patch: Partial<Record<FilterKey, string | undefined>>) => void;
}

const statusOptions = [
  { value: '', label: 'Any status' },
  ...jarStatuses.map((s) => ({ value: s, label: jarStatusLabels[s] })),
];

export const isFiltered = (f: JarListFilters) => hasAnyFilter(f, filterKeys);

export function JarsFilters({ filters, onChange }: JarsFiltersProps) {
  return (
    <FilterBar className="md:grid-cols-4">
      <SearchForm
        names={['q', 'room', 'shelf']}
        values={filters}
        onSearch={onChange}
        className="grid gap-2 sm:grid-cols-[1fr_1fr_1fr_auto] sm:items-end md:col-span-4"
        wordOnPhones
      >
        <TextInput
          label="Label starts with"
          name="q"
          type="search"
          defaultValue={filters.q ?? ''}
          placeholder="J-0001"
        />
        <TextInput label="Room" name="room" defaultValue={filters.room ?? ''} />
        <TextInput label="Shelf" name="shelf" defaultValue={filters.shelf ?? ''} />
      </SearchForm>
      <SelectFilter
        label="Status"
        options={statusOptions}
        value={filters.status}
        onChange={(status) => onChange({ status })}
      />
      <DateFilter label="Inoculated from" value={filters.from} onChange={(from) => onChange({ from })} />
      <DateFilter label="Inoculated to" value={filters.to} onChange={(to) => onChange({ to })} />
      <ClearFilters
        shown={isFiltered(filters)}
        onClear={() => onChange(clearedPatch(filterKeys))}
        className="flex items-end"
      />
    </FilterBar>
  );
}
