import type { FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/select';
import { TextInput } from '../../../components/ui/text-input';
import type { UserFilters } from '../api/users-queries';
import { roleOptions } from './role-options';

interface UsersFiltersProps {
  filters: UserFilters;
  onChange: (patch: Partial<Record<'role' | 'active' | 'q', string | undefined>>) => void;
}

const statusOptions = [
  { value: '', label: 'Any status' },
  { value: 'true', label: 'Active' },
  { value: 'false', label: 'Deactivated' },
];

export function UsersFilters({ filters, onChange }: UsersFiltersProps) {
  const submitSearch = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const value = new FormData(event.currentTarget).get('q');
    onChange({ q: typeof value === 'string' ? value.trim() || undefined : undefined });
  };
  const filtered = Boolean(filters.role || filters.active || filters.q);

  return (
    <div className="no-print mb-4 grid gap-4 rounded-lg border border-line bg-surface-raised p-4 md:grid-cols-[2fr_1fr_1fr]">
      {/* Keyed on the URL value so "Clear filters" and back/forward refill the box. */}
      <form role="search" onSubmit={submitSearch} className="flex items-end gap-2" key={filters.q ?? ''}>
        <TextInput
          label="Search"
          name="q"
          type="search"
          defaultValue={filters.q ?? ''}
          placeholder="Name or username"
          maxLength={64}
          className="flex-1"
        />
        <Button type="submit" variant="secondary" icon="search">
          <span className="sr-only sm:not-sr-only">Search</span>
        </Button>
      </form>
      <Select
        label="Role"
        value={filters.role ?? ''}
        options={[{ value: '', label: 'All roles' }, ...roleOptions]}
        onChange={(event) => onChange({ role: event.target.value || undefined })}
      />
      <Select
        label="Status"
        value={filters.active ?? ''}
        options={statusOptions}
        onChange={(event) => onChange({ active: event.target.value || undefined })}
      />
      {filtered && (
        <div className="md:col-span-3">
          <Button variant="ghost" onClick={() => onChange({ role: undefined, active: undefined, q: undefined })}>
            Clear filters
          </Button>
        </div>
      )}
    </div>
  );
}
