import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import { PageHeader } from '../../../components/ui/page-header';
import { Pager } from '../../../components/ui/table/pager';
import { TextInput } from '../../../components/ui/text-input';
import { todayIso } from '../../../lib/format';
import { patchParams, type TableState } from '../../../lib/list-params';
import { analysisQueries, csvUrl, readPeriod } from '../api/analysis-queries';
import { AnalysisTabs, CsvLink, LeadNotProof, LoadState, PeriodPicker, Table, num, th } from './analysis-frame';
import { CauseRowView } from './cause-row';
import { LeadCards } from './lead-cards';

const pageSizes = [20, 50, 100] as const;

const addDays = (date: string, days: number) =>
  new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

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
export function CausesScreen({ windowDays }: { windowDays?: number | undefined }) {
  const [params, setParams] = useSearchParams();
  const chosen = readPeriod(params);
  // Recent jars settle only once lost, so a period running up to today shows recent levels at their
  // worst; by default the screen stops at the last day whose jars have all settled.
  const settledThrough = windowDays === undefined ? undefined : addDays(todayIso(), -windowDays);
  const period = { from: chosen.from, to: chosen.to ?? settledThrough };
  const minJars = whole(params, 'minJars', 1);
  const page = whole(params, 'page', 1);
  const pageSize = readPageSize(params);
  const causes = useQuery({
    ...analysisQueries.causes(period, minJars, page, pageSize),
    enabled: chosen.to !== undefined || windowDays !== undefined,
  });
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
      {!chosen.to && settledThrough && (
        <p className="mb-4 text-sm" data-testid="settled-through">
          Jars inoculated up to {settledThrough}: later ones are still at risk, and counting only those already lost
          would make the newest weeks, runs and sessions look worse than they are. Set “To” to include them.
        </p>
      )}
      <PeriodPicker period={chosen}>
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
        query={causes}
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
