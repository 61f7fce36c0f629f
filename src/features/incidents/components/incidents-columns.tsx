import { createColumnHelper } from '@tanstack/react-table';
import { contaminantNames } from '../../../../shared/enums';
import type { IncidentListItemDto } from '../../../../shared/schemas/incidents';
import { CodeLink, DateCell } from '../../../components/ui/table/cells';
import { paths } from '../../../config/paths';
import { severityLabels, stageLabels } from '../labels';
import { IncidentBadges } from './incident-badges';

const column = createColumnHelper<IncidentListItemDto>();

export const incidentColumns = [
  column.accessor('id', {
    header: 'Incident',
    enableSorting: true,
    cell: ({ getValue }) => <CodeLink to={paths.incident.to(getValue())}>#{getValue()}</CodeLink>,
  }),
  column.accessor('foundAt', {
    header: 'Found',
    enableSorting: true,
    cell: ({ getValue }) => <DateCell value={getValue()} />,
  }),
  column.accessor('jarLabels', {
    header: 'Jars',
    cell: ({ getValue }) => {
      const labels = getValue();
      return labels.length > 3 ? `${labels.slice(0, 3).join(', ')} +${labels.length - 3}` : labels.join(', ');
    },
  }),
  column.accessor('contaminant', {
    header: 'Contaminant',
    enableSorting: true,
    cell: ({ getValue }) => contaminantNames[getValue()],
  }),
  column.accessor('severity', {
    header: 'Severity',
    enableSorting: true,
    cell: ({ getValue }) => severityLabels[getValue()],
  }),
  column.accessor('stage', { header: 'Stage', enableSorting: true, cell: ({ getValue }) => stageLabels[getValue()] }),
  column.accessor('status', {
    header: 'Status',
    enableSorting: true,
    cell: ({ row: { original: i } }) => <IncidentBadges status={i.status} verdict={i.verdict} voided={i.voided} />,
  }),
  column.accessor('foundByName', { header: 'Found by' }),
  column.accessor('photoCount', { header: 'Photos', meta: { className: 'tabular-nums' } }),
];
