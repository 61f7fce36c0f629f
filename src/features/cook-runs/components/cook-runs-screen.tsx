import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useSearchParams } from 'react-router';
import { Button, buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageHeader } from '../../../components/ui/page-header';
import { patchParams } from '../../../lib/list-params';
import { cookRunsExportUrl, cookRunsQueries, readCookRunFilters } from '../api/cook-runs-queries';
import { CookRunsFilters } from './cook-runs-filters';
import { CookRunsTable } from './cook-runs-table';
import { CreateCookRunDialog } from './create-cook-run-dialog';

interface Props {
  canWrite: boolean;
  me: { id: number; displayName: string };
}

export function CookRunsScreen({ canWrite, me }: Props) {
  const [searchParams, setSearchParams] = useSearchParams();
  const filters = readCookRunFilters(searchParams);
  const list = useQuery(cookRunsQueries.list(filters));
  const [creating, setCreating] = useState(false);
  const update = (patch: Record<string, string | number | undefined>) =>
    setSearchParams(patchParams(searchParams, patch));
  const filtered = Boolean(filters.q || filters.container || filters.from || filters.to || filters.lowLethality);

  return (
    <>
      <PageHeader
        title="Cook runs"
        description="Each sterilisation load with its lethality. Without a temperature log, F0 is an estimate from the chamber temperature — an upper bound, because the centre of a jar lags behind."
        actions={
          <>
            <a href={cookRunsExportUrl(filters)} download className={buttonClasses('secondary')}>
              Export CSV
            </a>
            {canWrite && (
              <Button icon="plus" onClick={() => setCreating(true)}>
                New cook run
              </Button>
            )}
          </>
        }
      />
      <CookRunsFilters filters={filters} onChange={update} />
      <CookRunsTable
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
          filtered ? (
            <EmptyState icon="search" title="No cook runs match these filters." />
          ) : (
            <EmptyState title="No cook runs recorded yet." />
          )
        }
      />
      {canWrite && <CreateCookRunDialog open={creating} onClose={() => setCreating(false)} me={me} />}
    </>
  );
}
