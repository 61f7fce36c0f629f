import { Checkbox } from '../../../components/ui/checkbox';
import { ClearFilters, FilterBar, SearchForm } from '../../../components/ui/filter-bar';
import { DateFilter, filterBinding, SearchText } from '../../../components/ui/filter-fields';
import { TextInput } from '../../../components/ui/text-input';
import { hasAnyFilter } from '../../../lib/list-params';
import type { CookRunListFilters } from '../api/cook-runs-queries';

type FilterKey = 'q' | 'container' | 'from' | 'to' | 'belowTarget';

interface CookRunsFiltersProps {
  filters: CookRunListFilters;
  onChange: (patch: Partial<Record<FilterKey, string | undefined>>) => void;
}

export const cookRunFilterKeys = ['q', 'container', 'from', 'to', 'belowTarget'] as const satisfies FilterKey[];
export const isCookRunFiltered = (filters: CookRunListFilters) => hasAnyFilter(filters, cookRunFilterKeys);

export function CookRunsFilters({ filters, onChange }: CookRunsFiltersProps) {
  const bind = filterBinding(filters, onChange);
  return (
    <FilterBar className="md:grid-cols-4">
      <SearchForm {...bind.search(['q', 'container'])} className="flex items-end gap-2 md:col-span-2">
        <SearchText placeholder="Code, vessel, operator" {...bind.text('q')} />
        <TextInput label="Container" placeholder="1 L jar" className="w-36" {...bind.text('container')} />
      </SearchForm>
      <DateFilter label="From" {...bind.value('from')} />
      <DateFilter label="To" {...bind.value('to')} />
      <Checkbox label="Only runs below their cook target" className="md:col-span-3" {...bind.flag('belowTarget')} />
      <ClearFilters {...bind.clear(cookRunFilterKeys)} />
    </FilterBar>
  );
}
