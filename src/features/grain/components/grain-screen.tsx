import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { useSearchParams } from 'react-router';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageHeader } from '../../../components/ui/page-header';
import { Select } from '../../../components/ui/select';
import { TextInput } from '../../../components/ui/text-input';
import { cx } from '../../../lib/cx';
import { patchParams } from '../../../lib/list-params';
import { grainQueries, readGrainFilters, type GrainView } from '../api/grain-queries';
import { AddGrainDialog, CreateGrainLotDialog, CreatePrepBatchDialog } from './grain-dialogs';
import { GrainLotsTable, PrepBatchesTable } from './grain-tables';

type OpenDialog = 'grain' | 'lot' | 'batch' | null;

interface Props {
  canWrite: boolean;
  canAddGrain: boolean;
}

export function GrainScreen({ canWrite, canAddGrain }: Props) {
  const [searchParams, setSearchParams] = useSearchParams();
  const filters = readGrainFilters(searchParams);
  const grains = useQuery(grainQueries.grains());
  const lots = useQuery({ ...grainQueries.lots(filters), enabled: filters.view === 'lots' });
  const batches = useQuery({ ...grainQueries.batches(filters), enabled: filters.view === 'batches' });
  const [dialog, setDialog] = useState<OpenDialog>(null);
  const update = (patch: Record<string, string | number | undefined>) =>
    setSearchParams(patchParams(searchParams, patch));
  const showView = (view: GrainView) =>
    update({ view: view === 'lots' ? undefined : view, sort: undefined, grainLotId: undefined });
  const search = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const q = new FormData(event.currentTarget).get('q');
    update({ q: typeof q === 'string' ? q.trim() || undefined : undefined });
  };
  const grainOptions = [
    { value: '', label: 'All grains' },
    ...(grains.data ?? []).map((g) => ({ value: String(g.id), label: g.name })),
  ];
  const list = filters.view === 'lots' ? lots : batches;
  const tableProps = {
    page: filters.page,
    pageSize: filters.pageSize,
    sort: filters.sort,
    onChange: update,
    isLoading: list.isPending,
    isFetching: list.isPlaceholderData,
    error: list.error,
    onRetry: () => void list.refetch(),
  };

  return (
    <>
      <PageHeader
        title="Grain"
        description="Grain lots as delivered, and the prep batches soaked, simmered and drained from them."
        actions={
          canWrite && (
            <>
              <Button variant="secondary" icon="plus" onClick={() => setDialog('lot')}>
                New grain lot
              </Button>
              <Button icon="plus" onClick={() => setDialog('batch')}>
                New prep batch
              </Button>
            </>
          )
        }
      />
      <section aria-label="Grain list" className="mb-6 flex flex-wrap items-center gap-2">
        <span className="text-muted">The lab’s grain list:</span>
        {(grains.data ?? []).map((g) => (
          <Badge key={g.id} tone={g.active ? 'neutral' : 'warn'}>
            {g.name}
          </Badge>
        ))}
        {canAddGrain && (
          <Button variant="ghost" icon="plus" onClick={() => setDialog('grain')}>
            Add grain
          </Button>
        )}
      </section>

      <div role="tablist" aria-label="Grain records" className="no-print mb-4 flex gap-2 border-b border-line">
        {(['lots', 'batches'] as const).map((view) => (
          <button
            key={view}
            type="button"
            role="tab"
            aria-selected={filters.view === view}
            onClick={() => showView(view)}
            className={cx(
              'min-h-touch border-b-4 px-4 font-semibold',
              filters.view === view ? 'border-accent text-ink' : 'border-transparent text-muted hover:text-ink',
            )}
          >
            {view === 'lots' ? 'Grain lots' : 'Prep batches'}
          </button>
        ))}
      </div>

      <div className="no-print mb-4 grid gap-4 rounded-lg border border-line bg-surface-raised p-4 md:grid-cols-[2fr_1fr]">
        <form role="search" onSubmit={search} className="flex items-end gap-2" key={filters.q ?? ''}>
          <TextInput
            label="Search"
            name="q"
            type="search"
            defaultValue={filters.q ?? ''}
            placeholder={filters.view === 'lots' ? 'Supplier lot code' : 'Batch code'}
            className="flex-1"
          />
          <Button type="submit" variant="secondary" icon="search">
            <span className="sr-only sm:not-sr-only">Search</span>
          </Button>
        </form>
        <Select
          label="Grain"
          value={filters.grainId ? String(filters.grainId) : ''}
          options={grainOptions}
          onChange={(e) => update({ grainId: e.target.value || undefined })}
        />
        {filters.grainLotId && (
          <p className="md:col-span-2">
            Showing the batches of one lot.{' '}
            <Button variant="ghost" onClick={() => update({ grainLotId: undefined })}>
              Show all batches
            </Button>
          </p>
        )}
      </div>

      {filters.view === 'lots' ? (
        <GrainLotsTable
          data={lots.data}
          {...tableProps}
          onShowBatches={(lot) => update({ view: 'batches', grainLotId: lot.id, sort: undefined, q: undefined })}
          empty={<EmptyState title="No grain lots match." />}
        />
      ) : (
        <PrepBatchesTable data={batches.data} {...tableProps} empty={<EmptyState title="No prep batches match." />} />
      )}

      {canAddGrain && <AddGrainDialog open={dialog === 'grain'} onClose={() => setDialog(null)} />}
      {canWrite && <CreateGrainLotDialog open={dialog === 'lot'} onClose={() => setDialog(null)} />}
      {canWrite && (
        <CreatePrepBatchDialog open={dialog === 'batch'} onClose={() => setDialog(null)} lotId={filters.grainLotId} />
      )}
    </>
  );
}
