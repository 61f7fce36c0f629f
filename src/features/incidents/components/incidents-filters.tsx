import type { FormEvent } from 'react';
import { contaminantNames, contaminants, incidentStatuses, verdicts } from '../../../../shared/enums';
import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/select';
import { TextInput } from '../../../components/ui/text-input';
import { incidentFilterKeys, type IncidentFilterKey, type IncidentListFilters } from '../api/incidents-queries';
import { statusLabels, verdictLabels } from '../labels';

interface IncidentsFiltersProps {
  filters: IncidentListFilters;
  onChange: (patch: Partial<Record<IncidentFilterKey, string | undefined>>) => void;
}

const any = { value: '', label: 'Any' };
const cleared = Object.fromEntries(incidentFilterKeys.map((k) => [k, undefined]));
const linked: { key: 'cookRunId' | 'cultureId' | 'sessionId'; label: string }[] = [
  { key: 'cookRunId', label: 'Cook run' },
  { key: 'cultureId', label: 'Culture' },
  { key: 'sessionId', label: 'Session' },
];

export function IncidentsFilters({ filters, onChange }: IncidentsFiltersProps) {
  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    const text = (key: string) => {
      const value = data.get(key);
      return typeof value === 'string' && value.trim() ? value.trim() : undefined;
    };
    onChange({ jar: text('jar'), operator: text('operator') });
  };
  const filtered = incidentFilterKeys.some((k) => filters[k] !== undefined);

  return (
    <div className="no-print mb-4 grid gap-4 rounded-lg border border-line bg-surface-raised p-4 sm:grid-cols-2 lg:grid-cols-4">
      <form role="search" onSubmit={submit} className="flex items-end gap-2 sm:col-span-2" key={`${filters.jar ?? ''}|${filters.operator ?? ''}`}>
        <TextInput label="Jar label" name="jar" type="search" defaultValue={filters.jar ?? ''} placeholder="Starts with…" className="flex-1" />
        <TextInput label="Operator" name="operator" defaultValue={filters.operator ?? ''} placeholder="Who inoculated" className="flex-1" />
        <Button type="submit" variant="secondary" icon="search">
          <span className="sr-only sm:not-sr-only">Search</span>
        </Button>
      </form>
      <Select label="Status" value={filters.status ?? ''} onChange={(e) => onChange({ status: e.target.value || undefined })} options={[any, ...incidentStatuses.map((s) => ({ value: s, label: statusLabels[s] }))]} />
      <Select label="Verdict" value={filters.verdict ?? ''} onChange={(e) => onChange({ verdict: e.target.value || undefined })} options={[any, ...verdicts.map((v) => ({ value: v, label: verdictLabels[v] }))]} />
      <Select
        label="Contaminant"
        value={filters.contaminant ?? ''}
        onChange={(e) => onChange({ contaminant: e.target.value || undefined })}
        options={[any, ...contaminants.map((c) => ({ value: c, label: contaminantNames[c] }))]}
      />
      <Select
        label="Voided"
        value={filters.voided ?? ''}
        onChange={(e) => onChange({ voided: e.target.value || undefined })}
        options={[{ value: '', label: 'Live and voided' }, { value: 'false', label: 'Live only' }, { value: 'true', label: 'Voided only' }]}
      />
      <TextInput label="Found from" type="date" value={filters.from ?? ''} onChange={(e) => onChange({ from: e.target.value || undefined })} />
      <TextInput label="Found to" type="date" value={filters.to ?? ''} onChange={(e) => onChange({ to: e.target.value || undefined })} />
      {linked.some((l) => filters[l.key]) && (
        <div className="flex flex-wrap items-end gap-2 sm:col-span-2 lg:col-span-4">
          {linked.map(
            (l) =>
              filters[l.key] && (
                <Button key={l.key} variant="secondary" icon="close" onClick={() => onChange({ [l.key]: undefined })}>
                  {l.label} #{filters[l.key]}
                </Button>
              ),
          )}
        </div>
      )}
      {filtered && (
        <div className="flex items-end">
          <Button variant="ghost" onClick={() => onChange(cleared)}>
            Clear filters
          </Button>
        </div>
      )}
    </div>
  );
}
