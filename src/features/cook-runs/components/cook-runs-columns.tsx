import { createColumnHelper } from '@tanstack/react-table';
import type { CookRunDto } from '../../../../shared/schemas/cook-runs';
import { CodeLink, dash, DateCell } from '../../../components/ui/table/cells';
import { paths } from '../../../config/paths';
import { LethalityFigure } from './lethality-figure';

const column = createColumnHelper<CookRunDto>();

export const cookRunColumns = [
  column.accessor('code', {
    header: 'Code',
    enableSorting: true,
    cell: ({ row: { original: run } }) => <CodeLink to={paths.cookRun.to(run.id)}>{run.code}</CodeLink>,
  }),
  column.accessor('cookedOn', {
    header: 'Date',
    enableSorting: true,
    cell: ({ getValue }) => <DateCell value={getValue()} />,
  }),
  column.accessor('container', { header: 'Container', enableSorting: true, cell: ({ getValue }) => dash(getValue()) }),
  column.accessor('minutesAtPressure', {
    header: 'Minutes at pressure',
    enableSorting: true,
    meta: { className: 'tabular-nums' },
  }),
  column.accessor('gaugeKPa', {
    header: 'Gauge',
    cell: ({ row: { original: run } }) =>
      run.gaugeKPa === null ? '—' : `${run.gaugeKPa.toFixed(1)} kPa (${run.gaugePsi?.toFixed(1)} psi)`,
  }),
  column.accessor('f0', {
    header: 'Lethality',
    enableSorting: true,
    cell: ({ row: { original: run } }) => <LethalityFigure run={run} />,
  }),
  column.accessor('operatorName', { header: 'Operator', cell: ({ getValue }) => dash(getValue()) }),
];
