import { useQuery } from '@tanstack/react-query';
import { Link, useSearchParams } from 'react-router';
import { contaminantNames, type Contaminant } from '../../../../shared/enums';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { PageHeader } from '../../../components/ui/page-header';
import { PlainTableHead } from '../../../components/ui/table/table-parts';
import { paths } from '../../../config/paths';
import { patchParams } from '../../../lib/list-params';
import { analysisQueries, readFactor, readPeriod, type JarsOnly } from '../api/analysis-queries';
import { AnalysisTabs, LoadState, Table, td, th } from './analysis-frame';
import { factorLabels } from './labels';

const onlyLabels: Record<JarsOnly, string> = {
  all: 'All jars',
  settled: 'Settled jars',
  contaminated: 'Contaminated jars',
  incubating: 'Incubating jars',
};

const headings = ['Jar', 'Inoculated', 'Status', 'Contaminant', 'Found', 'Incident'];

/** The jars behind a number on the analysis screens, each linking to its own page. */
export function JarsBehindScreen() {
  const [params, setParams] = useSearchParams();
  const period = readPeriod(params);
  const factor = readFactor(params, 'factor', 'grain');
  const level = params.get('level') ?? '';
  const level2 = params.get('level2') ?? '';
  const and =
    params.get('factor2') && level2 ? { factor: readFactor(params, 'factor2', 'grain'), level: level2 } : undefined;
  const onlyParam = params.get('only');
  const only: JarsOnly =
    onlyParam === 'contaminated' || onlyParam === 'incubating' || onlyParam === 'settled' ? onlyParam : 'all';
  const page = Math.max(1, Number(params.get('page')) || 1);
  const jars = useQuery({ ...analysisQueries.jars(factor, level, only, period, page, and), enabled: level !== '' });
  const data = jars.data;
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  const goToPage = (to: number) => setParams(patchParams(params, { page: to }));

  return (
    <>
      <PageHeader
        title={`${onlyLabels[only]}: ${factorLabels[factor]} ${level}${and ? `, ${factorLabels[and.factor]} ${and.level}` : ''}`}
        description={`Inoculated ${period.from ?? 'from the start'} to ${period.to ?? 'today'}.`}
      />
      <AnalysisTabs />
      <div className="no-print mb-4 flex flex-wrap gap-2">
        {(Object.keys(onlyLabels) as JarsOnly[]).map((o) => (
          <Button
            key={o}
            variant={o === only ? 'primary' : 'secondary'}
            onClick={() => setParams(patchParams(params, { only: o }))}
          >
            {onlyLabels[o]}
          </Button>
        ))}
      </div>
      <LoadState
        query={jars}
        asked={level !== ''}
        isEmpty={!data || data.items.length === 0}
        emptyTitle="No jars match."
      >
        {data && (
          <>
            <p className="mb-3 text-muted">{data.total} jars.</p>
            <Table caption="Jars behind the number">
              <thead>
                <PlainTableHead headings={headings} cellClassName={th} />
              </thead>
              <tbody>
                {data.items.map((j) => (
                  <tr key={j.id}>
                    <th scope="row" className={td}>
                      <Link to={paths.jarPage.to(j.label)} className="font-semibold text-accent underline">
                        {j.label}
                      </Link>
                    </th>
                    <td className={td}>{j.inoculatedOn}</td>
                    <td className={td}>
                      {j.contaminated ? (
                        <Badge tone="danger">contaminated</Badge>
                      ) : j.incubating ? (
                        <Badge tone="warn">incubating</Badge>
                      ) : (
                        j.status
                      )}
                    </td>
                    <td className={td}>
                      {j.contaminant ? (contaminantNames[j.contaminant as Contaminant] ?? j.contaminant) : '—'}
                    </td>
                    <td className={td}>{j.foundOn ?? '—'}</td>
                    <td className={td}>
                      {j.incidentId === null ? (
                        '—'
                      ) : (
                        <Link to={paths.incident.to(j.incidentId)} className="font-semibold text-accent underline">
                          #{j.incidentId}
                        </Link>
                      )}
                    </td>
                  </tr>
                ))}
              </tbody>
            </Table>
            {pages > 1 && (
              <div className="no-print mt-4 flex items-center gap-3">
                <Button variant="secondary" disabled={page <= 1} onClick={() => goToPage(page - 1)}>
                  Previous
                </Button>
                <span>
                  Page {page} of {pages}
                </span>
                <Button variant="secondary" disabled={page >= pages} onClick={() => goToPage(page + 1)}>
                  Next
                </Button>
              </div>
            )}
          </>
        )}
      </LoadState>
    </>
  );
}
