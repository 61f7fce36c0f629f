import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import { RegisterScreen } from '../../../components/layouts/register-screen';
import { buttonClasses } from '../../../components/ui/button';
import { paths } from '../../../config/paths';
import { useListParams } from '../../../lib/use-list-params';
import { jarsExportUrl, jarsQueries, readJarFilters } from '../api/jars-queries';
import { jarColumns } from './jars-columns';
import { isFiltered, JarsFilters } from './jars-filters';

export function JarsScreen({ canWrite }: { canWrite: boolean }) {
  const params = useListParams(readJarFilters);
  const { filters, update } = params;
  const list = useQuery(jarsQueries.list(filters));

  return (
    <RegisterScreen
      title="Jars"
      description="Every jar and bag, where it sits and how it is doing. Open a label for its whole story."
      exportHref={jarsExportUrl(filters)}
      actions={
        <>
          <Link to={paths.shelfWalk.to()} className={buttonClasses('secondary')}>
            Shelf walk
          </Link>
          {canWrite && (
            <Link to={paths.newJars.to()} className={buttonClasses('primary')}>
              Make jars
            </Link>
          )}
        </>
      }
      filters={<JarsFilters filters={filters} onChange={update} />}
      columns={jarColumns}
      query={list}
      params={params}
      empty={{
        filtered: isFiltered(filters),
        none: 'No jars recorded yet.',
        noMatch: 'No jars match these filters.',
      }}
    />
  );
}
