import { workspaces } from '../../../../shared/enums';
import { workspaceLabels } from '../../../../shared/schemas/sessions';
import { ClearFilters, FilterBar, SearchForm } from '../../../components/ui/filter-bar';
import { DateFilter, filterBinding, SearchText, SelectFilter } from '../../../components/ui/filter-fields';
import { TextInput } from '../../../components/ui/text-input';
import { hasAnyFilter } from '../../../lib/list-params';
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
  const bind = filterBinding(filters, onChange);
  return (
    <FilterBar className="md:grid-cols-4">
      <SearchForm {...bind.search(['q', 'operator'])} className="flex items-end gap-2 md:col-span-2">
        <SearchText placeholder="Code, operator, notes" {...bind.text('q')} />
        <TextInput label="Operator" className="w-40" {...bind.text('operator')} />
      </SearchForm>
      <DateFilter label="From" {...bind.value('from')} />
      <DateFilter label="To" {...bind.value('to')} />
      <SelectFilter label="Workspace" options={workspaceOptions} {...bind.value('workspace')} />
      <ClearFilters className="flex items-end" {...bind.clear(filterKeys)} />
    </FilterBar>
  );
}
