import { cultureStates } from '../../../../shared/enums';
import { FilterBar, SearchForm } from '../../../components/ui/filter-bar';
import { SelectFilter } from '../../../components/ui/filter-fields';
import { TextInput } from '../../../components/ui/text-input';
import type { CultureListFilters } from '../api/cultures-queries';
import { cultureStateLabels } from './culture-state-badge';

interface CulturesFiltersProps {
  filters: CultureListFilters;
  onChange: (patch: Partial<Record<'q' | 'state', string | undefined>>) => void;
}

const stateOptions = [
  { value: '', label: 'Any state' },
  ...cultureStates.map((s) => ({ value: s, label: cultureStateLabels[s] })),
];

export function CulturesFilters({ filters, onChange }: CulturesFiltersProps) {
  return (
    <FilterBar className="md:grid-cols-[2fr_1fr]">
      <SearchForm names={['q']} values={filters} onSearch={onChange}>
        <TextInput
          label="Search"
          name="q"
          type="search"
          defaultValue={filters.q ?? ''}
          placeholder="Code, species or strain"
          className="flex-1"
        />
      </SearchForm>
      <SelectFilter
        label="State"
        value={filters.state}
        options={stateOptions}
        onChange={(state) => onChange({ state })}
      />
    </FilterBar>
  );
}
