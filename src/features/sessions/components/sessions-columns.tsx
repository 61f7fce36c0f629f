import { createColumnHelper } from '@tanstack/react-table';
import { workspaceLabels, type SessionDto } from '../../../../shared/schemas/sessions';
import { CodeLink, dash, DateCell } from '../../../components/ui/table/cells';
import { paths } from '../../../config/paths';

const column = createColumnHelper<SessionDto>();

export const sessionColumns = [
  column.accessor('code', {
    header: 'Code',
    enableSorting: true,
    cell: ({ row: { original: s } }) => <CodeLink to={paths.session.to(s.id)}>{s.code}</CodeLink>,
  }),
  column.accessor('heldOn', {
    header: 'Date',
    enableSorting: true,
    cell: ({ getValue }) => <DateCell value={getValue()} />,
  }),
  column.accessor('operatorName', {
    id: 'operator',
    header: 'Operator',
    enableSorting: true,
    cell: ({ getValue }) => dash(getValue()),
  }),
  column.accessor('workspace', {
    header: 'Workspace',
    cell: ({ getValue }) => (getValue() ? workspaceLabels[getValue()!] : '—'),
  }),
  column.accessor('procedureVersionId', {
    header: 'Checklist',
    cell: ({ getValue }) => (getValue() ? 'Procedure followed' : <span className="text-muted">none</span>),
  }),
];
