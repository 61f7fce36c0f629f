import { factorNames, factors } from '../../../../shared/enums';
import { Checkbox } from '../../../components/ui/checkbox';
import { ClearFilters, FilterBar, SearchForm } from '../../../components/ui/filter-bar';
import { SelectFilter } from '../../../components/ui/filter-fields';
import { TextInput } from '../../../components/ui/text-input';
import { clearedPatch, hasAnyFilter } from '../../../lib/list-params';
import type { ActionListFilters } from '../api/actions-queries';

type FilterKey = 'state' | 'mine' | 'incidentId' | 'factor' | 'level' | 'q';
export const actionFilterKeys = ['state', 'mine', 'incidentId', 'factor', 'level', 'q'] as const satisfies FilterKey[];
export const isActionFiltered = (f: ActionListFilters) => hasAnyFilter(f, actionFilterKeys);

const stateOptions = [
  { value: '', label: 'Every action' },
  { value: 'open', label: 'Open' },
  { value: 'overdue', label: 'Overdue' },
  { value: 'due-soon', label: 'Due within a week' },
  { value: 'done', label: 'Done' },
];
const factorOptions = [
  { value: '', label: 'Any factor' },
  ...factors.map((f) => ({ value: f, label: factorNames[f] })),
];

interface Props {
  filters: ActionListFilters;
  onChange: (patch: Partial<Record<FilterKey, string | undefined>>) => void;
}

export function ActionsFilters({ filters, onChange }: Props) {
  return (
    <FilterBar className="md:grid-cols-4">
      <SelectFilter
        label="State"
        options={stateOptions}
        value={filters.state}
        onChange={(state) => onChange({ state })}
      />
      <SelectFilter
        label="Factor"
        options={factorOptions}
        value={filters.factor}
        onChange={(factor) => onChange({ factor, level: factor ? filters.level : undefined })}
      />
      <SearchForm
        names={['level', 'incidentId', 'q']}
        values={{ level: filters.level, incidentId: filters.incidentId?.toString(), q: filters.q }}
        onSearch={(patch) => onChange({ ...patch, incidentId: patch.incidentId?.replace(/^#/, '') })}
        className="flex flex-wrap items-end gap-2 md:col-span-2"
      >
        <TextInput
          label="Level"
          name="level"
          defaultValue={filters.level ?? ''}
          placeholder="CR-2614"
          disabled={!filters.factor}
          className="w-32"
        />
        <TextInput
          label="Incident"
          name="incidentId"
          defaultValue={filters.incidentId ?? ''}
          placeholder="#12"
          className="w-24"
        />
        <TextInput
          label="Search"
          name="q"
          type="search"
          defaultValue={filters.q ?? ''}
          placeholder="What, owner"
          className="flex-1"
        />
      </SearchForm>
      <Checkbox
        label="Only mine"
        checked={filters.mine === 'true'}
        onChange={(e) => onChange({ mine: e.target.checked ? 'true' : undefined })}
      />
      <ClearFilters shown={isActionFiltered(filters)} onClear={() => onChange(clearedPatch(actionFilterKeys))} />
    </FilterBar>
  );
}
