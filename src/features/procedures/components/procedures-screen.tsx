import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link } from 'react-router';
import type { Role } from '../../../../shared/enums';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { Spinner } from '../../../components/ui/spinner';
import { paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { formatDate } from '../../../lib/format';
import { proceduresQueries } from '../api/procedures-queries';
import { CreateProcedureDialog } from './create-procedure-dialog';

export const procedureEditors: readonly Role[] = ['trainer', 'admin'];

export function ProceduresScreen({ role }: { role: Role }) {
  const list = useQuery(proceduresQueries.list());
  const [creating, setCreating] = useState(false);
  const canEdit = procedureEditors.includes(role);
  return (
    <>
      <PageHeader
        title="Procedures"
        description="The lab’s written methods, as ordered steps. Each change is a new version; sessions record the version they followed."
        actions={
          canEdit && (
            <Button icon="plus" onClick={() => setCreating(true)}>
              New procedure
            </Button>
          )
        }
      />
      {list.isPending && <Spinner label="Loading procedures" />}
      {list.error && <Notice tone="danger">{errorMessage(list.error)}</Notice>}
      {list.data && list.data.items.length === 0 && (
        <EmptyState title="No procedures yet">Trainers publish the first one here.</EmptyState>
      )}
      {list.data && list.data.items.length > 0 && (
        <ul className="grid gap-3 sm:grid-cols-2">
          {list.data.items.map((p) => (
            <li key={p.id} className="rounded-lg border border-line bg-surface-raised p-4">
              <Link
                to={paths.procedure.to(p.id)}
                className="text-lg font-semibold text-accent underline-offset-2 hover:underline"
              >
                {p.title}
              </Link>
              <p className="text-muted">
                {p.code} · version {p.currentVersion ?? '–'} · since {formatDate(p.createdAt)}
              </p>
            </li>
          ))}
        </ul>
      )}
      <CreateProcedureDialog open={creating} onClose={() => setCreating(false)} />
    </>
  );
}
