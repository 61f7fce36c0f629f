import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import { buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { QueryTable } from '../../../components/ui/table/query-table';
import { paths } from '../../../config/paths';
import { countText } from '../../../lib/count-text';
import { useListParams } from '../../../lib/use-list-params';
import { jarsQueries, readJarFilters } from '../api/jars-queries';
import { sessionJarColumns } from './jars-columns';

/** The jars a session made, paged on the server, with the way to make more from the same session. */
export function SessionJars({ sessionId, canWrite }: { sessionId: number; canWrite: boolean }) {
  // Only the table's page and sort come from this page's URL; the session is the page's own.
  const { filters: table, update } = useListParams(readJarFilters);
  const filters = { page: table.page, pageSize: table.pageSize, sort: table.sort, status: undefined, sessionId };
  const list = useQuery(jarsQueries.list(filters));
  const total = list.data?.total;

  return (
    <section aria-labelledby="session-jars-title" className="rounded-lg border border-line bg-surface-raised">
      <div className="flex flex-wrap items-center justify-between gap-3 p-4">
        <h2 id="session-jars-title" className="text-lg font-semibold">
          Jars{total !== undefined ? ` (${countText(total, list.data?.totalCapped)})` : ''}
        </h2>
        <div className="flex flex-wrap gap-2">
          {Boolean(total) && (
            <Link to={paths.jarLabels.to({ session: sessionId })} className={buttonClasses('secondary')}>
              Print labels
            </Link>
          )}
          {canWrite && (
            <Link to={paths.newJars.to(sessionId)} className={buttonClasses('primary')}>
              Make more jars
            </Link>
          )}
        </div>
      </div>
      <QueryTable
        caption="Jars of this session"
        columns={sessionJarColumns}
        query={list}
        state={filters}
        onChange={update}
        empty={<EmptyState title="No jars recorded from this session yet." />}
      />
    </section>
  );
}
