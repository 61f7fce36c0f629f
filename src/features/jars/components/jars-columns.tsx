import { createColumnHelper } from '@tanstack/react-table';
import type { JarRowDto } from '../../../../shared/schemas/jars';
import { CodeLink, dash, DateCell } from '../../../components/ui/table/cells';
import { paths } from '../../../config/paths';
import { JarStatusBadge } from './jar-status-badge';

const column = createColumnHelper<JarRowDto>();

export const jarColumns = [
  column.accessor('label', {
    header: 'Label',
    enableSorting: true,
    cell: ({ getValue }) => <CodeLink to={paths.jarPage.to(getValue())}>{getValue()}</CodeLink>,
  }),
  column.accessor('status', {
    header: 'Status',
    enableSorting: true,
    cell: ({ getValue }) => <JarStatusBadge status={getValue()} />,
  }),
  column.accessor('grain', { header: 'Grain', enableSorting: true }),
  column.accessor('inoculatedOn', {
    header: 'Inoculated',
    enableSorting: true,
    cell: ({ getValue }) => <DateCell value={getValue()} />,
  }),
  column.display({
    id: 'inoculum',
    header: 'Inoculum',
    cell: ({ row: { original: j } }) => dash(j.cultureCode ?? (j.parentJarLabel ? `jar ${j.parentJarLabel}` : null)),
  }),
  column.accessor('sessionCode', { header: 'Session', cell: ({ getValue }) => dash(getValue()) }),
  column.accessor('cookRunCode', { header: 'Cook run', cell: ({ getValue }) => dash(getValue()) }),
  column.accessor('room', {
    header: 'Room / shelf',
    enableSorting: true,
    meta: { label: 'Room / shelf' },
    cell: ({ row: { original: j } }) =>
      j.room ? `${j.room} / ${j.shelf ?? '—'}${j.shelfPosition ? ` #${j.shelfPosition}` : ''}` : '—',
  }),
];
