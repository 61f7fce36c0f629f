import { workspaces } from '../../../../shared/enums';
import { workspaceLabels } from '../../../../shared/schemas/sessions';
import { ClearFilters, FilterBar, SearchForm } from '../../../components/ui/filter-bar';
import { DateFilter, SelectFilter } from '../../../components/ui/filter-fields';
import { TextInput } from '../../../components/ui/text-input';
import { clearedPatch, hasAnyFilter } from '../../../lib/list-params';
import type { SessionListFilters } from '../api/sessions-queries';

type FilterKey = 'q' | 'operator' | 'from' | 'to' | 'workspace';

interface SessionsFiltersProps {
  filters: SessionListFilters;
  onChange: (patch: Partial<Record<FilterKey, string | undefined>>) => void;
}

const workspaceOptions = [
  { value: '', label: 'Any workspace' },
  ...workspaces.map((w) => ({ value: w, label: workspaceLabels[w] })),
];
const filterKeys = ['q', 'operator', 'from', 'to', 'workspace'] as const satisfies FilterKey[];
export const isSessionFiltered = (filters: SessionListFilters) => hasAnyFilter(filters, filterKeys);

export function SessionsFilters({ filters, onChange }: SessionsFiltersProps) {
  return (
    <FilterBar className="md:grid-cols-4">
      <SearchForm
        names={['q', 'operator']}
        values={filters}
        onSearch={onChange}
        className="flex items-end gap-2 md:col-span-2"
      >
        <TextInput
          label="Search"
          name="q"
          type="search"
          defaultValue={filters.q ?? ''}
          placeholder="Code, operator, notes"
          className="flex-1"
        />
        <TextInput label="Operator" name="operator" defaultValue={filters.operator ?? ''} className="w-40" />
      </SearchForm>
      <DateFilter label="From" value={filters.from} onChange={(from) => onChange({ from })} />
      <DateFilter label="To" value={filters.to} onChange={(to) => onChange({ to })} />
      <SelectFilter
        label="Workspace"
        value={filters.workspace}
        options={workspaceOptions}
        onChange={(workspace) => onChange({ workspace })}
      />
      <ClearFilters
        shown={isSessionFiltered(filters)}
        onClear={() => onChange(clearedPatch(filterKeys))}
        className="flex items-end"
      />
    </FilterBar>
  );
}
