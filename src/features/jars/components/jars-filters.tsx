import type { FormEvent } from 'react';
import { jarStatuses } from '../../../../shared/enums';
import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/select';
import { TextInput } from '../../../components/ui/text-input';
import type { JarListFilters } from '../api/jars-queries';
import { jarStatusLabels } from './jar-status-badge';

type FilterKey =
  'q' | 'status' | 'room' | 'shelf' | 'from' | 'to' | 'sessionId' | 'cookRunId' | 'cultureId' | 'grainId';

interface JarsFiltersProps {
  filters: JarListFilters;
  onChange: (patch: Partial<Record<FilterKey, string | undefined>>) => void;
}

const statusOptions = [
  { value: '', label: 'Any status' },
  ...jarStatuses.map((s) => ({ value: s, label: jarStatusLabels[s] })),
];
const cleared: Record<FilterKey, undefined> = {
  q: undefined,
  status: undefined,
  room: undefined,
  shelf: undefined,
  from: undefined,
  to: undefined,
  sessionId: undefined,
  cookRunId: undefined,
  cultureId: undefined,
  grainId: undefined,
};

export const isFiltered = (f: JarListFilters) => (Object.keys(cleared) as FilterKey[]).some((k) => f[k] !== undefined);

export function JarsFilters({ filters, onChange }: JarsFiltersProps) {
  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    const text = (key: string) => {
      const value = data.get(key);
      return typeof value === 'string' && value.trim() ? value.trim() : undefined;
    };
    onChange({ q: text('q'), room: text('room'), shelf: text('shelf') });
  };

  return (
    <div className="no-print mb-4 grid gap-4 rounded-lg border border-line bg-surface-raised p-4 md:grid-cols-4">
      <form
        role="search"
        onSubmit={submit}
        className="grid gap-2 sm:grid-cols-[1fr_1fr_1fr_auto] sm:items-end md:col-span-4"
        key={`${filters.q ?? ''}|${filters.room ?? ''}|${filters.shelf ?? ''}`}
      >
        <TextInput
          label="Label starts with"
          name="q"
          type="search"
          defaultValue={filters.q ?? ''}
          placeholder="J-0001"
        />
        <TextInput label="Room" name="room" defaultValue={filters.room ?? ''} />
        <TextInput label="Shelf" name="shelf" defaultValue={filters.shelf ?? ''} />
        <Button type="submit" variant="secondary" icon="search">
          Search
        </Button>
      </form>
      <Select
        label="Status"
        options={statusOptions}
        value={filters.status ?? ''}
        onChange={(e) => onChange({ status: e.target.value || undefined })}
      />
      <TextInput
        label="Inoculated from"
        type="date"
        value={filters.from ?? ''}
        onChange={(e) => onChange({ from: e.target.value || undefined })}
      />
      <TextInput
        label="Inoculated to"
        type="date"
        value={filters.to ?? ''}
        onChange={(e) => onChange({ to: e.target.value || undefined })}
      />
      {isFiltered(filters) && (
        <div className="flex items-end">
          <Button variant="ghost" onClick={() => onChange(cleared)}>
            Clear filters
          </Button>
        </div>
      )}
    </div>
  );
}
