import { useQuery } from '@tanstack/react-query';
import { Link, useSearchParams } from 'react-router';
import { factorNames } from '../../../../shared/enums';
import { PageHeader } from '../../../components/ui/page-header';
import { Pager } from '../../../components/ui/table/pager';
import { paths } from '../../../config/paths';
import { patchParams, type TableState } from '../../../lib/list-params';
import { analysisQueries } from '../api/analysis-queries';
import { BeforeAfterFigures } from './action-verdict';
import { AnalysisTabs, LoadState } from './analysis-frame';

const pageSizes = [10, 25, 50] as const;

/** Every corrective action with its before/after verdict, a page at a time: the supervisor's one list. */
export function ActionVerdictsScreen() {
  const [params, setParams] = useSearchParams();
  const page = Math.max(1, Number(params.get('page')) || 1);
  const size = Number(params.get('pageSize'));
  const pageSize = (pageSizes as readonly number[]).includes(size) ? size : pageSizes[0];
  const actions = useQuery(analysisQueries.actions(page, pageSize));
  const data = actions.data;
  return (
    <>
      <PageHeader
        title="Did it work?"
        description="Each corrective action’s factor level: its rate in equal periods before and after the day it was done, over settled jars."
      />
      <AnalysisTabs />
      <LoadState query={actions} isEmpty={!data || data.total === 0} emptyTitle="No corrective actions yet.">
        <ul className="grid gap-3">
          {data?.items.map((a) => (
            <li key={a.id} className="rounded border border-line p-3" data-testid="action-verdict">
              <p className="font-medium">{a.what}</p>
              <p className="text-sm text-muted">
                <Link className="text-accent underline" to={paths.incident.to(a.incidentId)}>
                  Incident {a.incidentId}
                </Link>{' '}
                · {a.ownerName}
                {a.factor && a.level ? ` · ${factorNames[a.factor]} ${a.level}` : ''}
                {a.doneOn ? ` · done ${a.doneOn}` : ' · not done yet'}
              </p>
              {a.comparison ? <BeforeAfterFigures d={a.comparison} /> : <p className="text-sm">{a.unavailable}</p>}
            </li>
          ))}
        </ul>
        {data && data.total > pageSizes[0] && (
          <Pager
            page={page}
            pageSize={pageSize}
            total={data.total}
            onChange={(patch: Partial<TableState>) => setParams(patchParams(params, patch))}
            sizes={pageSizes}
          />
        )}
      </LoadState>
    </>
  );
}
