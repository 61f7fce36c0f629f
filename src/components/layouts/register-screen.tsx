import type { ReactNode } from 'react';
import { buttonClasses } from '../ui/button';
import { PageHeader } from '../ui/page-header';
import { QueryTable, type QueryTableProps } from '../ui/table/query-table';

interface RegisterScreenProps<T> extends Omit<QueryTableProps<T>, 'caption'> {
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
  const { title, description, exportHref, actions, filters, children, ...table } = props;
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
      <QueryTable caption={title} {...table} />
      {children}
    </>
  );
}
