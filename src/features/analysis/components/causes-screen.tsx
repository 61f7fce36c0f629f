import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import { factorSchema, factors } from '../../../../shared/enums';
import type { CauseRow } from '../../../../shared/schemas/analysis';
import { Checkbox } from '../../../components/ui/checkbox';
import { PageHeader } from '../../../components/ui/page-header';
import { Select } from '../../../components/ui/select';
import { Pager } from '../../../components/ui/table/pager';
import { TextInput } from '../../../components/ui/text-input';
import { patchParams, type TableState } from '../../../lib/list-params';
import { analysisQueries, csvUrl, readPeriod } from '../api/analysis-queries';
import { AnalysisTabs, CsvLink, LeadNotProof, LoadState, PeriodPicker, Table, num, th } from './analysis-frame';
import { CauseRowView } from './cause-row';
import { factorLabels } from './labels';

const pageSizes = [20, 50, 100] as const;

function whole(params: URLSearchParams, key: string, fallback: number): number {
  const n = Number(params.get(key));
  return Number.isInteger(n) && n >= 1 ? n : fallback;
}

const readPageSize = (params: URLSearchParams) => {
  const size = whole(params, 'pageSize', pageSizes[0]);
  return (pageSizes as readonly number[]).includes(size) ? size : pageSizes[0];
};

/** Levels per factor among the rows the other filters keep, for the factor picker. */
function factorChoices(rows: CauseRow[]) {
  const counts = new Map<string, number>();
  for (const r of rows) counts.set(r.factor, (counts.get(r.factor) ?? 0) + 1);
  return [
    { value: '', label: `All factors (${rows.length})` },
    ...factors
      .filter((f) => counts.has(f))
      .map((f) => ({ value: f, label: `${factorLabels[f]} (${counts.get(f) ?? 0})` })),
  ];
}

/** Likely causes, ranked: each level against the rest of its factor. The answer arrives whole; it is paged here. */
export function CausesScreen() {
  const [params, setParams] = useSearchParams();
  const period = readPeriod(params);
  const minJars = whole(params, 'minJars', 1);
  const harmfulOnly = params.get('all') !== '1';
  const factor = factorSchema.safeParse(params.get('factor')).data;
  const page = whole(params, 'page', 1);
  const pageSize = readPageSize(params);
  const causes = useQuery(analysisQueries.causes(period, minJars));

  const ranked = (causes.data?.causes ?? []).map((row, i) => ({ row, rank: i + 1 }));
  const kept = ranked.filter(({ row }) => !harmfulOnly || row.relativeRisk > 1);
  const shown = kept.filter(({ row }) => !factor || row.factor === factor);
  const lastPage = Math.max(1, Math.ceil(shown.length / pageSize));
  const pageRows = shown.slice((Math.min(page, lastPage) - 1) * pageSize, Math.min(page, lastPage) * pageSize);
  const setPage = (patch: Partial<TableState>) => setParams(patchParams(params, patch));

  return (
    <>
      <PageHeader
        title="Likely causes"
        description="Every level of every factor against the rest: its contamination rate, relative risk, and how surprising the difference would be by chance."
        actions={<CsvLink href={csvUrl('causes', { ...period, minJars })} />}
      />
      <AnalysisTabs />
      <LeadNotProof />
      <PeriodPicker period={period}>
        <TextInput
          type="number"
          label="Smallest level"
          hint="Jars a level needs to be tested"
          min={1}
          value={minJars}
          onChange={(e) => setParams(patchParams(params, { minJars: e.target.value || undefined }))}
          className="w-44"
        />
        <Select
          label="Factor"
          options={factorChoices(kept.map((k) => k.row))}
          value={factor ?? ''}
          onChange={(e) => setParams(patchParams(params, { factor: e.target.value || undefined }))}
          className="w-56"
        />
        <Checkbox
          label="Only levels that fare worse than the rest"
          checked={harmfulOnly}
          onChange={(e) => setParams(patchParams(params, { all: e.target.checked ? undefined : '1' }))}
        />
      </PeriodPicker>
      <LoadState
        isPending={causes.isPending}
        error={causes.error}
        onRetry={() => void causes.refetch()}
        isEmpty={shown.length === 0}
        emptyTitle={
          factor
            ? `No ${factorLabels[factor].toLowerCase()} stands out in this period.`
            : 'No level stands out in this period.'
        }
      >
        <Table caption="Likely causes, most likely first" tableClassName="max-sm:block">
          <thead className="max-sm:hidden">
            <tr>
              <th scope="col" className={`${th} ${num}`}>
                #
              </th>
              <th scope="col" className={th}>
                Level
              </th>
              <th scope="col" className={`${th} ${num}`}>
                Contaminated jars
              </th>
              <th scope="col" className={`${th} ${num}`}>
                Relative risk (95 %)
              </th>
              <th scope="col" className={`${th} ${num}`}>
                q (BH)
              </th>
              <th scope="col" className={th}>
                Hint from the trade
              </th>
            </tr>
          </thead>
          <tbody className="max-sm:block">
            {pageRows.map(({ row, rank }) => (
              <CauseRowView key={`${row.factor}:${row.level}`} row={row} rank={rank} period={period} />
            ))}
          </tbody>
        </Table>
        {shown.length > pageSizes[0] && (
          <Pager
            page={Math.min(page, lastPage)}
            pageSize={pageSize}
            total={shown.length}
            onChange={setPage}
            sizes={pageSizes}
          />
        )}
        <p className="mt-4 text-sm text-muted">
          Fisher’s exact test, two-sided; q-values by Benjamini–Hochberg over every level tested; relative risk with the
          log-method interval, adding 0.5 to each cell when one is zero. Hints are rules of thumb of the trade (common
          practice unless a source is named) — check them against the jars, not instead of them.
        </p>
      </LoadState>
    </>
  );
}
