import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { Role } from '../../../../shared/enums';
import type { OperatorRowDto } from '../../../../shared/schemas/training';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { Spinner } from '../../../components/ui/spinner';
import { errorMessage } from '../../../lib/api-client';
import { formatDate } from '../../../lib/format';
import { trainingQueries } from '../api/training-queries';
import { RecordTrainingDialog, RetrainDialog } from './person-dialogs';
import { PlainTableHead } from '../../../components/ui/table/table-parts';

const recorders: readonly Role[] = ['trainer', 'admin'];
const requesters: readonly Role[] = ['trainer', 'supervisor', 'admin'];

export function TrainingScreen({ role, procedureId }: { role: Role; procedureId: number | undefined }) {
  const operators = useQuery(trainingQueries.operators(procedureId));
  const records = useQuery(trainingQueries.records(operators.data?.procedure?.id));
  const [training, setTraining] = useState<OperatorRowDto | null>(null);
  const [retrain, setRetrain] = useState<OperatorRowDto | null>(null);
  const procedure = operators.data?.procedure;
  const versionId = procedure?.currentVersionId ?? null;
  return (
    <>
      <PageHeader
        title="Training"
        description={
          procedure
            ? `Who is trained on the current version (${procedure.currentVersion ?? '–'}) of “${procedure.title}”, beside the incidents on jars from their sessions.`
            : 'Publish a procedure first; training is recorded against its versions.'
        }
      />
      {operators.isPending && <Spinner label="Loading operators" />}
      {operators.error && <Notice tone="danger">{errorMessage(operators.error)}</Notice>}
      {operators.data && operators.data.operators.length === 0 && <EmptyState title="No operators yet" />}
      {operators.data && operators.data.operators.length > 0 && (
        <div className="overflow-x-auto rounded-lg border border-line bg-surface-raised">
          <table className="w-full text-left">
            <caption className="sr-only">Operators and their training</caption>
            <thead className="border-b border-line text-muted">
              <PlainTableHead
                headings={['Person', 'Sessions', 'Jars', 'Incidents', 'Trained on', '']}
                cellClassName="px-3 py-2 font-medium"
              />
            </thead>
            <tbody>
              {operators.data.operators.map((o) => (
                <tr key={o.userId ?? `s${o.staffId}`} className="border-b border-line last:border-0">
                  <th scope="row" className="px-3 py-2 font-medium">
                    {o.displayName}
                    {o.staffId !== null && (
                      <span className="block text-sm font-normal text-muted">Staff, no account</span>
                    )}
                  </th>
                  <td className="px-3 py-2">{o.sessions}</td>
                  <td className="px-3 py-2">{o.jars}</td>
                  <td className="px-3 py-2">
                    {o.incidents} ({o.contaminatedJars} jars)
                  </td>
                  <td className="px-3 py-2">
                    {o.trainedOnCurrent ? (
                      <Badge tone="ok">current version</Badge>
                    ) : o.trainedVersion ? (
                      <Badge tone="warn">version {o.trainedVersion} only</Badge>
                    ) : (
                      <Badge tone="danger">not trained</Badge>
                    )}
                    {o.lastTrainedOn && <span className="ml-2 text-muted">{formatDate(o.lastTrainedOn)}</span>}
                    {o.openRetrainRequests > 0 && <span className="ml-2 text-warn">retraining asked</span>}
                  </td>
                  <td className="flex flex-wrap gap-2 px-3 py-2">
                    {versionId !== null && recorders.includes(role) && (
                      <Button variant="secondary" onClick={() => setTraining(o)}>
                        Record training<span className="sr-only"> for {o.displayName}</span>
                      </Button>
                    )}
                    {versionId !== null && requesters.includes(role) && (
                      <Button variant="ghost" onClick={() => setRetrain(o)}>
                        Ask to retrain<span className="sr-only"> {o.displayName}</span>
                      </Button>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {records.data && records.data.items.length > 0 && (
        <>
          <h2 className="mb-3 mt-8 text-xl font-semibold">Training records</h2>
          <ul className="flex flex-col gap-2">
            {records.data.items.map((r) => (
              <li key={r.id}>
                {formatDate(r.trainedOn)} — {r.personName} on version {r.version}, by {r.trainerName}
                {r.notes ? ` (${r.notes})` : ''}
              </li>
            ))}
          </ul>
        </>
      )}
      {procedure && versionId !== null && (
        <>
          <RecordTrainingDialog
            person={training}
            versionId={versionId}
            version={procedure.currentVersion ?? 0}
            onClose={() => setTraining(null)}
          />
          <RetrainDialog
            person={retrain}
            versionId={versionId}
            version={procedure.currentVersion ?? 0}
            onClose={() => setRetrain(null)}
          />
        </>
      )}
    </>
  );
}
