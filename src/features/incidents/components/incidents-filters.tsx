import { contaminantNames, contaminants, incidentStatuses, verdicts } from '../../../../shared/enums';
import { Button } from '../../../components/ui/button';
import { ClearFilters, FilterBar, SearchForm } from '../../../components/ui/filter-bar';
import { DateFilter, filterBinding, SearchText, SelectFilter } from '../../../components/ui/filter-fields';
import { TextInput } from '../../../components/ui/text-input';
import { incidentFilterKeys, type IncidentFilterKey, type IncidentListFilters } from '../api/incidents-queries';
import { statusLabels, verdictLabels } from '../labels';

interface IncidentsFiltersProps {
  filters: IncidentListFilters;
  onChange: (patch: Partial<Record<IncidentFilterKey, string | undefined>>) => void;
}

const any = { value: '', label: 'Any' };
const statusOptions = [any, ...incidentStatuses.map((s) => ({ value: s, label: statusLabels[s] }))];
const verdictOptions = [any, ...verdicts.map((v) => ({ value: v, label: verdictLabels[v] }))];
const contaminantOptions = [any, ...contaminants.map((c) => ({ value: c, label: contaminantNames[c] }))];
const voidedOptions = [
  { value: '', label: 'Live and voided' },
  { value: 'false', label: 'Live only' },
  { value: 'true', label: 'Voided only' },
];
const linked: { key: 'cookRunId' | 'cultureId' | 'sessionId'; label: string }[] = [
  { key: 'cookRunId', label: 'Cook run' },
  { key: 'cultureId', label: 'Culture' },
  { key: 'sessionId', label: 'Session' },
];

export function IncidentsFilters({ filters, onChange }: IncidentsFiltersProps) {
  const bind = filterBinding(filters, onChange);
  return (
    <FilterBar className="sm:grid-cols-2 lg:grid-cols-4">
      <SearchForm {...bind.search(['jar', 'operator'])} className="flex items-end gap-2 sm:col-span-2">
        <SearchText label="Jar label" placeholder="Starts with…" {...bind.text('jar')} />
        <TextInput label="Operator" placeholder="Who inoculated" className="flex-1" {...bind.text('operator')} />
      </SearchForm>
      <SelectFilter label="Status" options={statusOptions} {...bind.value('status')} />
      <SelectFilter label="Verdict" options={verdictOptions} {...bind.value('verdict')} />
      <SelectFilter label="Contaminant" options={contaminantOptions} {...bind.value('contaminant')} />
      <SelectFilter label="Voided" options={voidedOptions} {...bind.value('voided')} />
      <DateFilter label="Found from" {...bind.value('from')} />
      <DateFilter label="Found to" {...bind.value('to')} />
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
      <ClearFilters className="flex items-end" {...bind.clear(incidentFilterKeys)} />
    </FilterBar>
  );
}
