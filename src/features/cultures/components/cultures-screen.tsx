import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { useSearchParams } from 'react-router';
import { cultureStates } from '../../../../shared/enums';
import { Button, buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageHeader } from '../../../components/ui/page-header';
import { Select } from '../../../components/ui/select';
import { TextInput } from '../../../components/ui/text-input';
import { patchParams } from '../../../lib/list-params';
import { culturesExportUrl, culturesQueries, readCultureFilters } from '../api/cultures-queries';
import { CreateCultureDialog } from './create-culture-dialog';
import { cultureStateLabels } from './culture-state-badge';
import { CulturesTable } from './cultures-table';

const stateOptions = [
  { value: '', label: 'Any state' },
  ...cultureStates.map((s) => ({ value: s, label: cultureStateLabels[s] })),
];

export function CulturesScreen({ canWrite }: { canWrite: boolean }) {
  const [searchParams, setSearchParams] = useSearchParams();
  const filters = readCultureFilters(searchParams);
  const list = useQuery(culturesQueries.list(filters));
  const [creating, setCreating] = useState(false);
  const update = (patch: Record<string, string | number | undefined>) =>
    setSearchParams(patchParams(searchParams, patch));
  const search = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const q = new FormData(event.currentTarget).get('q');
    update({ q: typeof q === 'string' ? q.trim() || undefined : undefined });
  };
  const filtered = Boolean(filters.q || filters.state);

  return (
    <>
      <PageHeader
        title="Cultures"
        description="Syringes and liquid-culture lots. A culture is quarantined until a supervisor releases it; using one that is not released is flagged."
        actions={
          <>
            <a href={culturesExportUrl(filters)} download className={buttonClasses('secondary')}>
              Export CSV
            </a>
            {canWrite && (
              <Button icon="plus" onClick={() => setCreating(true)}>
                New culture
              </Button>
            )}
          </>
        }
      />
      <div className="no-print mb-4 grid gap-4 rounded-lg border border-line bg-surface-raised p-4 md:grid-cols-[2fr_1fr]">
        <form role="search" onSubmit={search} className="flex items-end gap-2" key={filters.q ?? ''}>
          <TextInput
            label="Search"
            name="q"
            type="search"
            defaultValue={filters.q ?? ''}
            placeholder="Code, species or strain"
            className="flex-1"
          />
          <Button type="submit" variant="secondary" icon="search">
            <span className="sr-only sm:not-sr-only">Search</span>
          </Button>
        </form>
        <Select
          label="State"
          value={filters.state ?? ''}
          options={stateOptions}
          onChange={(e) => update({ state: e.target.value || undefined })}
        />
      </div>
      <CulturesTable
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
            <EmptyState
              icon="search"
              title="No cultures match these filters."
              action={
                <Button variant="secondary" onClick={() => update({ q: undefined, state: undefined })}>
                  Clear filters
                </Button>
              }
            />
          ) : (
            <EmptyState title="No cultures recorded yet." />
          )
        }
      />
      {canWrite && <CreateCultureDialog open={creating} onClose={() => setCreating(false)} />}
    </>
  );
}
