import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import { RegisterScreen } from '../../../components/layouts/register-screen';
import { buttonClasses } from '../../../components/ui/button';
import { paths } from '../../../config/paths';
import { useListParams } from '../../../lib/use-list-params';
import {
  hasIncidentFilters,
  incidentsExportUrl,
  incidentsQueries,
  readIncidentFilters,
} from '../api/incidents-queries';
import { incidentColumns } from './incidents-columns';
import { IncidentsFilters } from './incidents-filters';

export function IncidentsScreen({ canFlag }: { canFlag: boolean }) {
  const params = useListParams(readIncidentFilters);
  const { filters, update } = params;
  const list = useQuery(incidentsQueries.list(filters));

  return (
    <RegisterScreen
      title="Incidents"
      description="Every flagged jar, its review and its verdict. Voided incidents stay listed with their reason; they no longer count as contamination."
      exportHref={incidentsExportUrl(filters)}
      actions={
        canFlag && (
          <Link to={paths.flagJar.to()} className={buttonClasses('primary')}>
            Flag a jar
          </Link>
        )
      }
      filters={<IncidentsFilters filters={filters} onChange={update} />}
      columns={incidentColumns}
      query={list}
      params={params}
      empty={{
        filtered: hasIncidentFilters(filters),
        none: 'No incidents recorded yet.',
        noMatch: 'No incidents match these filters.',
      }}
    />
  );
}
