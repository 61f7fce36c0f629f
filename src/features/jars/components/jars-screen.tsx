import { useQuery } from '@tanstack/react-query';
import { Link, useSearchParams } from 'react-router';
import { buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { patchParams } from '../../../lib/list-params';
import { jarsExportUrl, jarsQueries, readJarFilters } from '../api/jars-queries';
import { isFiltered, JarsFilters } from './jars-filters';
import { JarsTable } from './jars-table';

export function JarsScreen({ canWrite }: { canWrite: boolean }) {
  const [searchParams, setSearchParams] = useSearchParams();
  const filters = readJarFilters(searchParams);
  const list = useQuery(jarsQueries.list(filters));
  const update = (patch: Record<string, string | number | undefined>) =>
    setSearchParams(patchParams(searchParams, patch));

  return (
    <>
      <PageHeader
        title="Jars"
        description="Every jar and bag, where it sits and how it is doing. Open a label for its whole story."
        actions={
          <>
            <a href={jarsExportUrl(filters)} download className={buttonClasses('secondary')}>
              Export CSV
            </a>
            <Link to={paths.shelfWalk.to()} className={buttonClasses('secondary')}>
              Shelf walk
            </Link>
            {canWrite && (
              <Link to={paths.newJars.to()} className={buttonClasses('primary')}>
                Make jars
              </Link>
            )}
          </>
        }
      />
      <JarsFilters filters={filters} onChange={update} />
      <JarsTable
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
          isFiltered(filters) ? (
            <EmptyState icon="search" title="No jars match these filters." />
          ) : (
            <EmptyState title="No jars recorded yet." />
          )
        }
      />
    </>
  );
}
