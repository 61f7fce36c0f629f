import { createColumnHelper } from '@tanstack/react-table';
import type { JarRowDto } from '../../../../shared/schemas/jars';
import { CodeLink, dash, DateCell } from '../../../components/ui/table/cells';
import { paths } from '../../../config/paths';
import { JarStatusBadge } from './jar-status-badge';

const column = createColumnHelper<JarRowDto>();

const columns = {
  label: column.accessor('label', {
    header: 'Label',
    enableSorting: true,
    cell: ({ getValue }) => <CodeLink to={paths.jarPage.to(getValue())}>{getValue()}</CodeLink>,
  }),
  status: column.accessor('status', {
    header: 'Status',
    enableSorting: true,
    cell: ({ getValue }) => <JarStatusBadge status={getValue()} />,
  }),
  grain: column.accessor('grain', { header: 'Grain', enableSorting: true }),
  inoculatedOn: column.accessor('inoculatedOn', {
    header: 'Inoculated',
    enableSorting: true,
    cell: ({ getValue }) => <DateCell value={getValue()} />,
  }),
  inoculum: column.display({
    id: 'inoculum',
    header: 'Inoculum',
    cell: ({ row: { original: j } }) => dash(j.cultureCode ?? (j.parentJarLabel ? `jar ${j.parentJarLabel}` : null)),
  }),
  session: column.accessor('sessionCode', { header: 'Session', cell: ({ getValue }) => dash(getValue()) }),
  cookRun: column.accessor('cookRunCode', { header: 'Cook run', cell: ({ getValue }) => dash(getValue()) }),
  room: column.accessor('room', {
    header: 'Room / shelf',
    enableSorting: true,
    meta: { label: 'Room / shelf' },
    cell: ({ row: { original: j } }) =>
      j.room ? `${j.room} / ${j.shelf ?? '—'}${j.shelfPosition ? ` #${j.shelfPosition}` : ''}` : '—',
  }),
};

export const jarColumns = Object.values(columns);

/** A session's own jars: the session column would say the same thing on every row. */
export const sessionJarColumns = [columns.label, columns.grain, columns.status, columns.inoculatedOn, columns.room];
