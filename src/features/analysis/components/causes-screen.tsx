import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import { PageHeader } from '../../../components/ui/page-header';
import { Pager } from '../../../components/ui/table/pager';
import { TextInput } from '../../../components/ui/text-input';
import { patchParams, type TableState } from '../../../lib/list-params';
import { analysisQueries, csvUrl, readPeriod } from '../api/analysis-queries';
import { AnalysisTabs, CsvLink, LeadNotProof, LoadState, PeriodPicker, Table, num, th } from './analysis-frame';
import { CauseRowView } from './cause-row';
import { LeadCards } from './lead-cards';

const pageSizes = [20, 50, 100] as const;

function whole(params: URLSearchParams, key: string, fallback: number): number {
  const n = Number(params.get(key));
  return Number.isInteger(n) && n >= 1 ? n : fallback;
}

const readPageSize = (params: URLSearchParams) => {
  const size = whole(params, 'pageSize', pageSizes[0]);
  return (pageSizes as readonly number[]).includes(size) ? size : pageSizes[0];
};

/**
 * Likely causes: the leads first, in plain words, then every level by where it stands once the leads
 * are allowed for, a page at a time from the server.
 */
export function CausesScreen() {
  const [params, setParams] = useSearchParams();
  const period = readPeriod(params);
  const minJars = whole(params, 'minJars', 1);
  const page = whole(params, 'page', 1);
  const pageSize = readPageSize(params);
  const causes = useQuery(analysisQueries.causes(period, minJars, page, pageSize));
  const data = causes.data;
  const leads = (data?.leads ?? []).map(({ factor, level }) => ({ factor, level }));
  const setPage = (patch: Partial<TableState>) => setParams(patchParams(params, patch));

  return (
    <>
      <PageHeader
        title="Likely causes"
        description="The levels that stand out once each is allowed for the others, then every level against the rest of its factor, over settled jars."
        actions={<CsvLink href={csvUrl('causes', { ...period, minJars })} />}
      />
      <AnalysisTabs />
      <LeadNotProof />
      <PeriodPicker period={period}>
        <TextInput
          type="number"
          label="Smallest level"
          hint="Settled jars a level needs to be tested"
          min={1}
          value={minJars}
          onChange={(e) => setParams(patchParams(params, { minJars: e.target.value || undefined, page: undefined }))}
          className="w-44"
        />
      </PeriodPicker>
      <LoadState
        isPending={causes.isPending}
        error={causes.error}
        onRetry={() => void causes.refetch()}
        isEmpty={!data || data.total === 0}
        emptyTitle="No level has settled jars on both sides in this period."
      >
        {data && <LeadCards leads={data.leads} period={period} />}
        <Table caption="Every level tested, by where it stands" tableClassName="max-sm:block">
          <thead className="max-sm:hidden">
            <tr>
              <th scope="col" className={`${th} ${num}`}>
                #
              </th>
              <th scope="col" className={th}>
                Level
              </th>
              <th scope="col" className={`${th} ${num}`}>
                Contaminated of settled jars
              </th>
              <th scope="col" className={`${th} ${num}`}>
                Relative risk (95 %)
              </th>
              <th scope="col" className={`${th} ${num}`}>
                q (BH)
              </th>
              <th scope="col" className={th}>
                Where it stands
              </th>
            </tr>
          </thead>
          <tbody className="max-sm:block">
            {(data?.causes ?? []).map((row, i) => (
              <CauseRowView
                key={`${row.factor}:${row.level}`}
                row={row}
                rank={(page - 1) * pageSize + i + 1}
                period={period}
                leads={leads}
              />
            ))}
          </tbody>
        </Table>
        {data && data.total > pageSizes[0] && (
          <Pager page={page} pageSize={pageSize} total={data.total} onChange={setPage} sizes={pageSizes} />
        )}
        <p className="mt-4 text-sm text-muted">
          Settled jars only: contaminated, or older than the observation window. Leads are chosen one at a time by the
          Mantel–Haenszel relative risk stratified by the leads so far (Mantel & Haenszel 1959; interval by Greenland &
          Robins 1985) and the Cochran–Mantel–Haenszel test against a Bonferroni bar; crude figures by Fisher’s exact
          test with Benjamini–Hochberg q-values. Hints are rules of thumb of the trade (common practice unless a source
          is named) — check them against the jars, not instead of them.
        </p>
      </LoadState>
    </>
  );
}
