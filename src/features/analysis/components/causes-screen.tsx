import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useSearchParams } from 'react-router';
import type { CauseRow } from '../../../../shared/schemas/analysis';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Checkbox } from '../../../components/ui/checkbox';
import { PageHeader } from '../../../components/ui/page-header';
import { TextInput } from '../../../components/ui/text-input';
import { paths } from '../../../config/paths';
import { patchParams } from '../../../lib/list-params';
import { analysisQueries, csvUrl, readPeriod, type Period } from '../api/analysis-queries';
import { AnalysisTabs, CsvLink, LeadNotProof, LoadState, PeriodPicker, Table, num, td, th } from './analysis-frame';
import { factorLabels, formatP, percent, ratio } from './labels';

const PAGE = 50;

function readMinJars(params: URLSearchParams): number {
  const n = Number(params.get('minJars'));
  return Number.isInteger(n) && n >= 1 ? n : 1;
}

function JarsLink({
  row,
  period,
  only,
  children,
}: {
  row: CauseRow;
  period: Period;
  only: 'all' | 'contaminated';
  children: React.ReactNode;
}) {
  return (
    <Link
      to={paths.analysisJars.to({ factor: row.factor, level: row.level, only, from: period.from, to: period.to })}
      className="text-accent underline"
    >
      {children}
    </Link>
  );
}

function CauseRowView({ row, rank, period }: { row: CauseRow; rank: number; period: Period }) {
  const harmful = row.relativeRisk > 1;
  return (
    <tr data-testid="cause-row" className={harmful && row.qValue < 0.05 ? 'bg-danger-soft/40' : undefined}>
      <td className={`${td} ${num} text-muted`}>{rank}</td>
      <th scope="row" className={`${td} text-left`}>
        <span className="block text-sm font-normal text-muted">{factorLabels[row.factor]}</span>
        <span className="font-semibold" data-testid="cause-level">
          {row.level}
        </span>
      </th>
      <td className={`${td} ${num}`}>
        <JarsLink row={row} period={period} only="contaminated">
          {row.contaminated}
        </JarsLink>{' '}
        of{' '}
        <JarsLink row={row} period={period} only="all">
          {row.jars}
        </JarsLink>
        <span className="block text-sm text-muted">
          {percent(row.rate)} vs {percent(row.restRate)} in the rest
        </span>
      </td>
      <td className={`${td} ${num}`}>
        <span className="font-semibold">{ratio(row.relativeRisk)}</span>
        <span className="block text-sm text-muted">
          {ratio(row.rr95[0])} – {ratio(row.rr95[1])}
        </span>
      </td>
      <td className={`${td} ${num}`}>
        {formatP(row.qValue)}
        <span className="block text-sm text-muted">p {formatP(row.pValue)}</span>
      </td>
      <td className={`${td} max-w-md`}>
        {row.hint ? (
          <>
            <p>{row.hint}</p>
            <p className="mt-1 text-sm text-muted">
              <Badge tone="neutral">Hint</Badge> {row.hintBasis}
            </p>
          </>
        ) : (
          <span className="text-muted">—</span>
        )}
        {row.confoundedWith.length > 0 && (
          <p className="mt-1 text-sm">
            <span className="font-medium">Same jars as: </span>
            {row.confoundedWith.map((c) => `${factorLabels[c.factor]} ${c.level}`).join(', ')}
          </p>
        )}
      </td>
    </tr>
  );
}

/** Likely causes, ranked: each level against the rest of its factor. */
export function CausesScreen() {
  const [params, setParams] = useSearchParams();
  const period = readPeriod(params);
  const minJars = readMinJars(params);
  const harmfulOnly = params.get('all') !== '1';
  const causes = useQuery(analysisQueries.causes(period, minJars));
  const [shown, setShown] = useState(PAGE);
  const rows = (causes.data?.causes ?? []).filter((c) => !harmfulOnly || c.relativeRisk > 1);

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
        isEmpty={rows.length === 0}
        emptyTitle="No level stands out in this period."
      >
        <Table caption="Likely causes, most likely first">
          <thead>
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
          <tbody>
            {rows.slice(0, shown).map((row, i) => (
              <CauseRowView key={`${row.factor}:${row.level}`} row={row} rank={i + 1} period={period} />
            ))}
          </tbody>
        </Table>
        {rows.length > shown && (
          <Button variant="secondary" className="mt-4" onClick={() => setShown((n) => n + PAGE)}>
            Show {Math.min(PAGE, rows.length - shown)} more of {rows.length - shown}
          </Button>
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
