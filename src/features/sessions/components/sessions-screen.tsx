import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { useSearchParams } from 'react-router';
import { workspaces } from '../../../../shared/enums';
import { workspaceLabels } from '../../../../shared/schemas/sessions';
import { Button, buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageHeader } from '../../../components/ui/page-header';
import { Select } from '../../../components/ui/select';
import { TextInput } from '../../../components/ui/text-input';
import { patchParams } from '../../../lib/list-params';
import { readSessionFilters, sessionsExportUrl, sessionsQueries } from '../api/sessions-queries';
import { CreateSessionDialog } from './create-session-dialog';
import { SessionsTable } from './sessions-table';

const workspaceOptions = [
  { value: '', label: 'Any workspace' },
  ...workspaces.map((w) => ({ value: w, label: workspaceLabels[w] })),
];
const cleared = { q: undefined, operator: undefined, from: undefined, to: undefined, workspace: undefined };

interface Props {
  canWrite: boolean;
  me: { id: number; displayName: string };
}

export function SessionsScreen({ canWrite, me }: Props) {
  const [searchParams, setSearchParams] = useSearchParams();
  const filters = readSessionFilters(searchParams);
  const list = useQuery(sessionsQueries.list(filters));
  const [creating, setCreating] = useState(false);
  const update = (patch: Record<string, string | number | undefined>) =>
    setSearchParams(patchParams(searchParams, patch));
  const search = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    const text = (key: string) => {
      const v = data.get(key);
      return typeof v === 'string' && v.trim() ? v.trim() : undefined;
    };
    update({ q: text('q'), operator: text('operator') });
  };
  const filtered = Boolean(filters.q || filters.operator || filters.from || filters.to || filters.workspace);

  return (
    <>
      <PageHeader
        title="Inoculation sessions"
        description="Who inoculated, where, and which procedure they followed. Jars point at their session, so contamination can be traced to technique or workspace."
        actions={
          <>
            <a href={sessionsExportUrl(filters)} download className={buttonClasses('secondary')}>
              Export CSV
            </a>
            {canWrite && (
              <Button icon="plus" onClick={() => setCreating(true)}>
                New session
              </Button>
            )}
          </>
        }
      />
      <div className="no-print mb-4 grid gap-4 rounded-lg border border-line bg-surface-raised p-4 md:grid-cols-4">
        <form
          role="search"
          onSubmit={search}
          className="flex items-end gap-2 md:col-span-2"
          key={`${filters.q ?? ''}|${filters.operator ?? ''}`}
        >
          <TextInput
            label="Search"
            name="q"
            type="search"
            defaultValue={filters.q ?? ''}
            placeholder="Code, operator, notes"
            className="flex-1"
          />
          <TextInput label="Operator" name="operator" defaultValue={filters.operator ?? ''} className="w-40" />
          <Button type="submit" variant="secondary" icon="search">
            <span className="sr-only sm:not-sr-only">Search</span>
          </Button>
        </form>
        <TextInput
          label="From"
          type="date"
          value={filters.from ?? ''}
          onChange={(e) => update({ from: e.target.value || undefined })}
        />
        <TextInput
          label="To"
          type="date"
          value={filters.to ?? ''}
          onChange={(e) => update({ to: e.target.value || undefined })}
        />
        <Select
          label="Workspace"
          value={filters.workspace ?? ''}
          options={workspaceOptions}
          onChange={(e) => update({ workspace: e.target.value || undefined })}
        />
        {filtered && (
          <div className="flex items-end">
            <Button variant="ghost" onClick={() => update(cleared)}>
              Clear filters
            </Button>
          </div>
        )}
      </div>
      <SessionsTable
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
            <EmptyState icon="search" title="No sessions match these filters." />
          ) : (
            <EmptyState title="No sessions recorded yet." />
          )
        }
      />
      {canWrite && <CreateSessionDialog open={creating} onClose={() => setCreating(false)} me={me} />}
    </>
  );
}
