import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link } from 'react-router';
import type { Role } from '../../../../shared/enums';
import type { ProcedureStepDto } from '../../../../shared/schemas/procedures';
import { Badge } from '../../../components/ui/badge';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { Spinner } from '../../../components/ui/spinner';
import { paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { formatDate } from '../../../lib/format';
import { proceduresQueries } from '../api/procedures-queries';
import { LinkIncidentDialog } from './link-incident-dialog';
import { procedureEditors } from './procedures-screen';
import { StepCard } from './step-card';

export function VersionScreen({ id, role }: { id: number; role: Role }) {
  const version = useQuery(proceduresQueries.version(id));
  const [linking, setLinking] = useState<ProcedureStepDto | null>(null);
  if (version.isPending) return <Spinner label="Loading the version" />;
  if (version.error) return <Notice tone="danger">{errorMessage(version.error)}</Notice>;
  const v = version.data;
  return (
    <>
      <PageHeader
        title={`${v.title}, version ${v.version}`}
        description={
          <>
            {v.procedureCode} · published {formatDate(v.publishedAt)}
            {v.publishedByName ? ` by ${v.publishedByName}` : ''} ·{' '}
            <Link to={paths.procedure.to(v.procedureId)} className="text-accent underline">
              all versions
            </Link>
          </>
        }
        actions={v.isCurrent ? <Badge tone="ok">current version</Badge> : <Badge tone="warn">superseded</Badge>}
      />
      {!v.isCurrent && (
        <Notice tone="warn" className="mb-4" title="An older version">
          Kept as it was published, for the sessions and training records that name it.
        </Notice>
      )}
      {v.changeNote && <p className="mb-4">Change: {v.changeNote}</p>}
      <Notice className="mb-4" title="Reading the step figures">
        Jars from sessions where the step was ticked against jars where it was not, with Fisher’s exact test. Jars of
        one session are not independent, so a small p is a lead for a trainer to follow, not proof of a cause. 70 %
        isopropyl alcohol is flammable: let it dry before any flame. Local codes and licensed practice come first.
      </Notice>
      <ol className="flex flex-col gap-3">
        {v.steps.map((s) => (
          <StepCard key={s.id} step={s} canLink={procedureEditors.includes(role)} onLink={() => setLinking(s)} />
        ))}
      </ol>
      <LinkIncidentDialog step={linking} onClose={() => setLinking(null)} />
    </>
  );
}
