import { contaminantNames, contaminants, incidentStatuses, verdicts } from '../../../../shared/enums';
import { Button } from '../../../components/ui/button';
import { ClearFilters, FilterBar, SearchForm } from '../../../components/ui/filter-bar';
import { DateFilter, SelectFilter } from '../../../components/ui/filter-fields';
import { TextInput } from '../../../components/ui/text-input';
import { clearedPatch } from '../../../lib/list-params';
import {
  hasIncidentFilters,
  incidentFilterKeys,
  type IncidentFilterKey,
  type IncidentListFilters,
} from '../api/incidents-queries';
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
  return (
    <FilterBar className="sm:grid-cols-2 lg:grid-cols-4">
      <SearchForm
        names={['jar', 'operator']}
        values={filters}
        onSearch={onChange}
        className="flex items-end gap-2 sm:col-span-2"
      >
        <TextInput
          label="Jar label"
          name="jar"
          type="search"
          defaultValue={filters.jar ?? ''}
          placeholder="Starts with…"
          className="flex-1"
        />
        <TextInput
          label="Operator"
          name="operator"
          defaultValue={filters.operator ?? ''}
          placeholder="Who inoculated"
          className="flex-1"
        />
      </SearchForm>
      <SelectFilter
        label="Status"
        value={filters.status}
        onChange={(status) => onChange({ status })}
        options={statusOptions}
      />
      <SelectFilter
        label="Verdict"
        value={filters.verdict}
        onChange={(verdict) => onChange({ verdict })}
        options={verdictOptions}
      />
      <SelectFilter
        label="Contaminant"
        value={filters.contaminant}
        onChange={(contaminant) => onChange({ contaminant })}
        options={contaminantOptions}
      />
      <SelectFilter
        label="Voided"
        value={filters.voided}
        onChange={(voided) => onChange({ voided })}
        options={voidedOptions}
      />
      <DateFilter label="Found from" value={filters.from} onChange={(from) => onChange({ from })} />
      <DateFilter label="Found to" value={filters.to} onChange={(to) => onChange({ to })} />
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
      <ClearFilters
        shown={hasIncidentFilters(filters)}
        onClear={() => onChange(clearedPatch(incidentFilterKeys))}
        className="flex items-end"
      />
    </FilterBar>
  );
}
