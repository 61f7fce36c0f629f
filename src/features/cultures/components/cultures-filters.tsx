import { cultureStates } from '../../../../shared/enums';
import { FilterBar, SearchForm } from '../../../components/ui/filter-bar';
import { filterBinding, SearchText, SelectFilter } from '../../../components/ui/filter-fields';
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
  const bind = filterBinding(filters, onChange);
  return (
    <FilterBar className="md:grid-cols-[2fr_1fr]">
      <SearchForm {...bind.search(['q'])}>
        <SearchText placeholder="Code, species or strain" {...bind.text('q')} />
      </SearchForm>
      <SelectFilter label="State" options={stateOptions} {...bind.value('state')} />
    </FilterBar>
  );
}
