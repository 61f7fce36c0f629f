import { createColumnHelper } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { contaminantNames } from '../../../../shared/enums';
import type { Page } from '../../../../shared/schemas/common';
import type { IncidentListItemDto } from '../../../../shared/schemas/incidents';
import { DataTable } from '../../../components/ui/table/data-table';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import type { TableState } from '../../../lib/list-params';
import { severityLabels, stageLabels } from '../labels';
import { IncidentBadges } from './incident-badges';

interface IncidentsTableProps extends TableState {
  data: Page<IncidentListItemDto> | undefined;
  isLoading: boolean;
  isFetching: boolean;
  error: unknown;
  onRetry: () => void;
  onChange: (patch: Partial<TableState>) => void;
  empty: ReactNode;
}

const column = createColumnHelper<IncidentListItemDto>();

const columns = [
  column.accessor('id', {
    header: 'Incident',
    enableSorting: true,
    cell: ({ getValue }) => (
      <Link to={paths.incident.to(getValue())} className="font-medium text-accent underline-offset-2 hover:underline">
        #{getValue()}
      </Link>
    ),
  }),
  column.accessor('foundAt', {
    header: 'Found',
    enableSorting: true,
    cell: ({ row: { original: i } }) => <span className="whitespace-nowrap">{formatDate(i.foundAt)}</span>,
  }),
  column.accessor('jarLabels', {
    header: 'Jars',
    cell: ({ getValue }) => {
      const labels = getValue();
      return labels.length > 3 ? `${labels.slice(0, 3).join(', ')} +${labels.length - 3}` : labels.join(', ');
    },
  }),
  column.accessor('contaminant', { header: 'Contaminant', enableSorting: true, cell: ({ getValue }) => contaminantNames[getValue()] }),
  column.accessor('severity', { header: 'Severity', enableSorting: true, cell: ({ getValue }) => severityLabels[getValue()] }),
  column.accessor('stage', { header: 'Stage', enableSorting: true, cell: ({ getValue }) => stageLabels[getValue()] }),
  column.accessor('status', {
    header: 'Status',
    enableSorting: true,
    cell: ({ row: { original: i } }) => <IncidentBadges status={i.status} verdict={i.verdict} voided={i.voided} />,
  }),
  column.accessor('foundByName', { header: 'Found by' }),
  column.accessor('photoCount', { header: 'Photos', meta: { className: 'tabular-nums' } }),
];

export function IncidentsTable({ data, ...table }: IncidentsTableProps) {
  return (
    <DataTable caption="Incidents" columns={columns} data={data?.items} total={data?.total ?? 0} getRowId={(i) => String(i.id)} {...table} />
  );
}
