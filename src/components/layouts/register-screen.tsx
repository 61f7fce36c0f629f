import type { ComponentProps, ReactNode } from 'react';
import type { ParamPatch, TableState } from '../../lib/list-params';
import { buttonClasses } from '../ui/button';
import { PageHeader } from '../ui/page-header';
import { RegisterEmpty } from '../ui/register-empty';
import { QueryTable, type QueryTableProps } from '../ui/table/query-table';

interface RegisterScreenProps<T> extends Omit<QueryTableProps<T>, 'caption' | 'state' | 'onChange' | 'empty'> {
  /** The filters, paging and sorting read from the URL, and the one way to change them. */
  params: { filters: TableState; update: (patch: ParamPatch) => void };
  /** What the table says when it has no row, with and without filters. */
  empty: ComponentProps<typeof RegisterEmpty>;
  /** Also names the table for screen readers. */
  title: string;
  description: ReactNode;
  exportHref?: string;
  /** Header buttons after the export link. */
  actions?: ReactNode;
  filters: ReactNode;
  /** Dialogs the screen opens. */
  children?: ReactNode;
}

/** A register: header with export and actions, the filter bar, then the server-paged table. */
export function RegisterScreen<T extends { id: number }>(props: RegisterScreenProps<T>) {
  const { title, description, exportHref, actions, filters, children, params, empty, ...table } = props;
  return (
    <>
      <PageHeader
        title={title}
        description={description}
        actions={
          (exportHref || actions) && (
            <>
              {exportHref && (
                <a href={exportHref} download className={buttonClasses('secondary')}>
                  Export CSV
                </a>
              )}
              {actions}
            </>
          )
        }
      />
      {filters}
      <QueryTable
        caption={title}
        state={params.filters}
        onChange={params.update}
        empty={<RegisterEmpty {...empty} />}
        {...table}
      />
      {children}
    </>
  );
}
