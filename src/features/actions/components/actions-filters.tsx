import { factorNames, factors } from '../../../../shared/enums';
import { Checkbox } from '../../../components/ui/checkbox';
import { ClearFilters, FilterBar, SearchForm } from '../../../components/ui/filter-bar';
import { filterBinding, SearchText, SelectFilter } from '../../../components/ui/filter-fields';
import { TextInput } from '../../../components/ui/text-input';
import { hasAnyFilter } from '../../../lib/list-params';
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
  const bind = filterBinding(filters, onChange);
  return (
    <FilterBar className="md:grid-cols-4">
      <SelectFilter label="State" options={stateOptions} {...bind.value('state')} />
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
          placeholder="CR-2614"
          disabled={!filters.factor}
          className="w-32"
          {...bind.text('level')}
        />
        <TextInput label="Incident" placeholder="#12" className="w-24" {...bind.text('incidentId')} />
        <SearchText placeholder="What, owner" {...bind.text('q')} />
      </SearchForm>
      <Checkbox label="Only mine" {...bind.flag('mine')} />
      <ClearFilters {...bind.clear(actionFilterKeys)} />
    </FilterBar>
  );
}
