import { createColumnHelper } from '@tanstack/react-table';
import type { CultureDto } from '../../../../shared/schemas/cultures';
import { CodeLink, dash, DateCell } from '../../../components/ui/table/cells';
import { paths } from '../../../config/paths';
import { CultureStateBadge } from './culture-state-badge';

const column = createColumnHelper<CultureDto>();

export const cultureColumns = [
  column.accessor('code', {
    header: 'Code',
    enableSorting: true,
    cell: ({ row: { original: c } }) => <CodeLink to={paths.culture.to(c.id)}>{c.code}</CodeLink>,
  }),
  column.accessor('species', {
    header: 'Species',
    enableSorting: true,
    cell: ({ row: { original: c } }) => (
      <>
        <span className="italic">{c.species ?? '—'}</span>
        {c.strain && <span className="block text-sm text-muted">{c.strain}</span>}
      </>
    ),
  }),
  column.accessor('preparedOn', {
    header: 'Prepared',
    enableSorting: true,
    cell: ({ getValue }) => <DateCell value={getValue()} />,
  }),
  column.accessor('generation', { header: 'Generation', cell: ({ getValue }) => dash(getValue()) }),
  column.accessor('parentCode', { header: 'Parent', cell: ({ getValue }) => dash(getValue()) }),
  column.accessor('state', {
    header: 'State',
    enableSorting: true,
    cell: ({ getValue }) => <CultureStateBadge state={getValue()} />,
  }),
];
