import { jarStatuses } from '../../../../shared/enums';
import { ClearFilters, FilterBar, SearchForm } from '../../../components/ui/filter-bar';
import { DateFilter, filterBinding, SelectFilter } from '../../../components/ui/filter-fields';
import { TextInput } from '../../../components/ui/text-input';
import { hasAnyFilter } from '../../../lib/list-params';
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
  const bind = filterBinding(filters, onChange);
  return (
    <FilterBar className="md:grid-cols-4">
      <SearchForm
        {...bind.search(['q', 'room', 'shelf'])}
        className="grid gap-2 sm:grid-cols-[1fr_1fr_1fr_auto] sm:items-end md:col-span-4"
        wordOnPhones
      >
        <TextInput label="Label starts with" type="search" placeholder="J-0001" {...bind.text('q')} />
        <TextInput label="Room" {...bind.text('room')} />
        <TextInput label="Shelf" {...bind.text('shelf')} />
      </SearchForm>
      <SelectFilter label="Status" options={statusOptions} {...bind.value('status')} />
      <DateFilter label="Inoculated from" {...bind.value('from')} />
      <DateFilter label="Inoculated to" {...bind.value('to')} />
      <ClearFilters className="flex items-end" {...bind.clear(filterKeys)} />
    </FilterBar>
  );
}
