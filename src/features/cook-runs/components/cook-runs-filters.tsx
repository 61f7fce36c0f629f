import { Checkbox } from '../../../components/ui/checkbox';
import { ClearFilters, FilterBar, SearchForm } from '../../../components/ui/filter-bar';
import { DateFilter } from '../../../components/ui/filter-fields';
import { TextInput } from '../../../components/ui/text-input';
import { clearedPatch, hasAnyFilter } from '../../../lib/list-params';
import type { CookRunListFilters } from '../api/cook-runs-queries';

type FilterKey = 'q' | 'container' | 'from' | 'to' | 'belowTarget';

interface CookRunsFiltersProps {
  filters: CookRunListFilters;
  onChange: (patch: Partial<Record<FilterKey, string | undefined>>) => void;
}

export const cookRunFilterKeys = ['q', 'container', 'from', 'to', 'belowTarget'] as const satisfies FilterKey[];
export const isCookRunFiltered = (filters: CookRunListFilters) => hasAnyFilter(filters, cookRunFilterKeys);

export function CookRunsFilters({ filters, onChange }: CookRunsFiltersProps) {
  return (
    <FilterBar className="md:grid-cols-4">
      <SearchForm
        names={['q', 'container']}
        values={filters}
        onSearch={onChange}
        className="flex items-end gap-2 md:col-span-2"
      >
        <TextInput
          label="Search"
          name="q"
          type="search"
          defaultValue={filters.q ?? ''}
          placeholder="Code, vessel, operator"
          className="flex-1"
        />
        <TextInput
          label="Container"
          name="container"
          defaultValue={filters.container ?? ''}
          placeholder="1 L jar"
          className="w-36"
        />
      </SearchForm>
      <DateFilter label="From" value={filters.from} onChange={(from) => onChange({ from })} />
      <DateFilter label="To" value={filters.to} onChange={(to) => onChange({ to })} />
      <Checkbox
        label="Only runs below their cook target"
        checked={filters.belowTarget === 'true'}
        onChange={(e) => onChange({ belowTarget: e.target.checked ? 'true' : undefined })}
        className="md:col-span-3"
      />
      <ClearFilters shown={isCookRunFiltered(filters)} onClear={() => onChange(clearedPatch(cookRunFilterKeys))} />
    </FilterBar>
  );
}
