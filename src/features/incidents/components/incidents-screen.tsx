import { useQuery } from '@tanstack/react-query';
import { Link, useSearchParams } from 'react-router';
import { buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { patchParams } from '../../../lib/list-params';
import { hasIncidentFilters, incidentsExportUrl, incidentsQueries, readIncidentFilters } from '../api/incidents-queries';
import { IncidentsFilters } from './incidents-filters';
import { IncidentsTable } from './incidents-table';

export function IncidentsScreen({ canFlag }: { canFlag: boolean }) {
  const [searchParams, setSearchParams] = useSearchParams();
  const filters = readIncidentFilters(searchParams);
  const list = useQuery(incidentsQueries.list(filters));
  const update = (patch: Record<string, string | number | undefined>) => setSearchParams(patchParams(searchParams, patch));

  return (
    <>
      <PageHeader
        title="Incidents"
        description="Every flagged jar, its review and its verdict. Voided incidents stay listed with their reason; they no longer count as contamination."
        actions={
          <>
            <a href={incidentsExportUrl(filters)} download className={buttonClasses('secondary')}>
              Export CSV
            </a>
            {canFlag && (
              <Link to={paths.flagJar.to()} className={buttonClasses('primary')}>
                Flag a jar
              </Link>
            )}
          </>
        }
      />
      <IncidentsFilters filters={filters} onChange={update} />
      <IncidentsTable
        data={list.data}
        page={filters.page}
        pageSize={filters.pageSize}
        sort={filters.sort}
        onChange={update}
        isLoading={list.isPending}
        isFetching={list.isPlaceholderData}
        error={list.error}
        onRetry={() => void list.refetch()}
        empty={
          hasIncidentFilters(filters) ? (
            <EmptyState icon="search" title="No incidents match these filters." />
          ) : (
            <EmptyState title="No incidents recorded yet." />
          )
        }
      />
    </>
  );
}
