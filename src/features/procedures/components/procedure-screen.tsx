import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link } from 'react-router';
import type { Role } from '../../../../shared/enums';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { Spinner } from '../../../components/ui/spinner';
import { paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { formatDate } from '../../../lib/format';
import { proceduresQueries } from '../api/procedures-queries';
import { PublishVersionDialog } from './publish-version-dialog';
import { procedureEditors } from './procedures-screen';

export function ProcedureScreen({ id, role }: { id: number; role: Role }) {
  const detail = useQuery(proceduresQueries.detail(id));
  const currentId = detail.data?.currentVersionId ?? null;
  const current = useQuery({ ...proceduresQueries.version(currentId ?? 0), enabled: currentId !== null });
  const [publishing, setPublishing] = useState(false);
  if (detail.isPending) return <Spinner label="Loading the procedure" />;
  if (detail.error) return <Notice tone="danger">{errorMessage(detail.error)}</Notice>;
  const p = detail.data;
  return (
    <>
      <PageHeader
        title={p.title}
        description={`${p.code} · current version ${p.currentVersion ?? '–'}`}
        actions={
          procedureEditors.includes(role) &&
          current.data && (
            <Button onClick={() => setPublishing(true)} icon="plus">
              Publish a new version
            </Button>
          )
        }
      />
      <h2 className="mb-3 text-xl font-semibold">Versions</h2>
      <ol className="flex flex-col gap-3">
        {p.versions.map((v) => (
          <li key={v.id} className="rounded-lg border border-line bg-surface-raised p-4">
            <div className="flex flex-wrap items-center gap-3">
              <Link
                to={paths.procedureVersion.to(v.id)}
                className="font-semibold text-accent underline-offset-2 hover:underline"
              >
                Version {v.version}: {v.title}
              </Link>
              {v.id === p.currentVersionId ? <Badge tone="ok">current</Badge> : <Badge>superseded</Badge>}
            </div>
            <p className="text-muted">
              {v.stepCount} steps · published {formatDate(v.publishedAt)}
              {v.publishedByName ? ` by ${v.publishedByName}` : ''}
            </p>
            {v.changeNote && <p className="mt-1">{v.changeNote}</p>}
          </li>
        ))}
      </ol>
      {current.data && (
        <PublishVersionDialog current={current.data} open={publishing} onClose={() => setPublishing(false)} />
      )}
    </>
  );
}
