import type { FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { Checkbox } from '../../../components/ui/checkbox';
import { TextInput } from '../../../components/ui/text-input';
import type { CookRunListFilters } from '../api/cook-runs-queries';

type FilterKey = 'q' | 'container' | 'from' | 'to' | 'lowLethality';

interface CookRunsFiltersProps {
  filters: CookRunListFilters;
  onChange: (patch: Partial<Record<FilterKey, string | undefined>>) => void;
}

const cleared = { q: undefined, container: undefined, from: undefined, to: undefined, lowLethality: undefined };

export function CookRunsFilters({ filters, onChange }: CookRunsFiltersProps) {
  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    const text = (key: string) => {
      const value = data.get(key);
      return typeof value === 'string' && value.trim() ? value.trim() : undefined;
    };
    onChange({ q: text('q'), container: text('container') });
  };
  const filtered = Boolean(filters.q || filters.container || filters.from || filters.to || filters.lowLethality);

  return (
    <div className="no-print mb-4 grid gap-4 rounded-lg border border-line bg-surface-raised p-4 md:grid-cols-4">
      <form
        role="search"
        onSubmit={submit}
        className="flex items-end gap-2 md:col-span-2"
        key={`${filters.q ?? ''}|${filters.container ?? ''}`}
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
        <Button type="submit" variant="secondary" icon="search">
          <span className="sr-only sm:not-sr-only">Search</span>
        </Button>
      </form>
      <TextInput
        label="From"
        type="date"
        value={filters.from ?? ''}
        onChange={(e) => onChange({ from: e.target.value || undefined })}
      />
      <TextInput
        label="To"
        type="date"
        value={filters.to ?? ''}
        onChange={(e) => onChange({ to: e.target.value || undefined })}
      />
      <Checkbox
        label="Only runs below the lethality target"
        checked={filters.lowLethality === 'true'}
        onChange={(e) => onChange({ lowLethality: e.target.checked ? 'true' : undefined })}
        className="md:col-span-3"
      />
      {filtered && (
        <div>
          <Button variant="ghost" onClick={() => onChange(cleared)}>
            Clear filters
          </Button>
        </div>
      )}
    </div>
  );
}
