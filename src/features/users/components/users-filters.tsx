import { ClearFilters, FilterBar, SearchForm } from '../../../components/ui/filter-bar';
import { filterBinding, SearchText, SelectFilter } from '../../../components/ui/filter-fields';
import type { UserFilters } from '../api/users-queries';
import { roleOptions } from './role-options';

interface UsersFiltersProps {
  filters: UserFilters;
  onChange: (patch: Partial<Record<'role' | 'active' | 'q', string | undefined>>) => void;
}

const roleFilterOptions = [{ value: '', label: 'All roles' }, ...roleOptions];
const statusOptions = [
  { value: '', label: 'Any status' },
  { value: 'true', label: 'Active' },
  { value: 'false', label: 'Deactivated' },
];

export const usersCleared = { role: undefined, active: undefined, q: undefined };
export const isUserFiltered = (filters: UserFilters) => Boolean(filters.role || filters.active || filters.q);

export function UsersFilters({ filters, onChange }: UsersFiltersProps) {
  const bind = filterBinding(filters, onChange);
  return (
    <FilterBar className="md:grid-cols-[2fr_1fr_1fr]">
      <SearchForm {...bind.search(['q'])}>
        <SearchText placeholder="Name or username" maxLength={64} {...bind.text('q')} />
      </SearchForm>
      <SelectFilter label="Role" options={roleFilterOptions} {...bind.value('role')} />
      <SelectFilter label="Status" options={statusOptions} {...bind.value('active')} />
      <ClearFilters shown={isUserFiltered(filters)} onClear={() => onChange(usersCleared)} className="md:col-span-3" />
    </FilterBar>
  );
}
