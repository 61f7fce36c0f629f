import { createColumnHelper } from '@tanstack/react-table';
import { contaminantNames, factorNames } from '../../../../shared/enums';
import type { ActionListItemDto } from '../../../../shared/schemas/corrective-actions';
import { Badge } from '../../../components/ui/badge';
import { CodeLink, DateCell } from '../../../components/ui/table/cells';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';

const column = createColumnHelper<ActionListItemDto>();

function StateCell({ a }: { a: ActionListItemDto }) {
  if (a.doneOn) return <Badge tone="ok">Done {formatDate(a.doneOn)}</Badge>;
  if (a.overdue) return <Badge tone="danger">Overdue</Badge>;
  return <Badge tone="warn">Open</Badge>;
}

export const actionColumns = [
  column.accessor('what', {
    header: 'Action',
    cell: ({ row: { original: a } }) => (
      <span className="block max-w-md">
        <CodeLink to={`${paths.incident.to(a.incidentId)}#action-${a.id}`}>{a.what}</CodeLink>
        {a.doneOn && a.verification && <span className="block text-sm text-muted">Verified: {a.verification}</span>}
      </span>
    ),
  }),
  column.accessor('incidentId', {
    header: 'Incident',
    enableSorting: true,
    cell: ({ row: { original: a } }) => (
      <span className="whitespace-nowrap">
        <CodeLink to={paths.incident.to(a.incidentId)}>#{a.incidentId}</CodeLink>{' '}
        <span className="text-sm text-muted">{contaminantNames[a.incident.contaminant]}</span>
        {a.incident.voided && <Badge tone="neutral">voided</Badge>}
      </span>
    ),
  }),
  column.accessor('ownerName', {
    header: 'Owner',
    enableSorting: true,
    cell: ({ row: { original: a } }) => (
      <>
        {a.ownerName}
        {a.ownerId === null && <span className="block text-sm text-muted">no account</span>}
      </>
    ),
  }),
  column.accessor('dueOn', {
    header: 'Due',
    enableSorting: true,
    cell: ({ getValue }) => <DateCell value={getValue()} />,
  }),
  column.display({ id: 'state', header: 'State', cell: ({ row: { original: a } }) => <StateCell a={a} /> }),
  column.accessor('level', {
    header: 'Factor level',
    cell: ({ row: { original: a } }) => (a.factor && a.level ? `${factorNames[a.factor]} ${a.level}` : '—'),
  }),
];
