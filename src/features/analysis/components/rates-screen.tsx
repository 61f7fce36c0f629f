import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import { Bar, BarChart, CartesianGrid, ErrorBar, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { factorNames } from '../../../../shared/enums';
import { PageHeader } from '../../../components/ui/page-header';
import { Select } from '../../../components/ui/select';
import { patchParams, readTableState } from '../../../lib/list-params';
import { analysisQueries, csvUrl, readFactor, readPeriod } from '../api/analysis-queries';
import { JarsLink } from './jars-link';
import { AnalysisTabs, CsvLink, LoadState, PeriodPicker, Table, TablePager, num, td, th } from './analysis-frame';
import { factorLabels, factorOptions, interval, percent } from './labels';
import { countOf } from '../../../lib/count-text';

const MAX_BARS = 40;

/** Contamination rate per level of one factor, each with its Wilson 95 % interval. */
export function RatesScreen() {
  const [params, setParams] = useSearchParams();
  const period = readPeriod(params);
  const by = readFactor(params, 'by', 'grain');
  const { page, pageSize } = readTableState(params, []);
  const rates = useQuery(analysisQueries.rates(by, period, page, pageSize));
  const data = rates.data;
  const bars = (data?.rows ?? []).slice(0, MAX_BARS).map((r) => ({
    level: r.level,
    rate: r.rate ?? 0,
    whisker: [(r.rate ?? 0) - r.ci95[0], r.ci95[1] - (r.rate ?? 0)],
  }));

  return (
    <>
      <PageHeader
        title="Contamination rates"
        description="The share of jars that turned, per level of the factor you choose, with a 95 % interval (Wilson score)."
        actions={<CsvLink href={csvUrl('rates', { by, ...period })} />}
      />
      <AnalysisTabs />
      <PeriodPicker period={period}>
        <Select
          label="Factor"
          options={factorOptions}
          value={by}
          onChange={(e) => setParams(patchParams(params, { by: e.target.value }))}
          className="w-56"
        />
      </PeriodPicker>
      <LoadState
        query={rates}
        isEmpty={!data || data.total === 0}
        emptyTitle={`No jars in this period record a ${factorNames[by]}.`}
      >
        {data && (
          <>
            <figure className="mb-6 rounded-lg border-2 border-line bg-surface-raised p-4">
              <figcaption className="mb-2 font-semibold">
                Rate by {factorNames[by]}, whiskers at the 95 % interval
                {data.rows.length > MAX_BARS && ` (first ${MAX_BARS} of the ${data.rows.length} levels on this page)`}
              </figcaption>
              <div className="h-72 w-full">
                <ResponsiveContainer width="100%" height="100%">
                  <BarChart data={bars} margin={{ top: 8, right: 16, bottom: 8, left: 8 }}>
                    <CartesianGrid stroke="#d3dad6" strokeDasharray="3 3" />
                    <XAxis dataKey="level" tick={{ fontSize: 12 }} />
                    <YAxis tickFormatter={(v: number) => percent(v)} width={64} tick={{ fontSize: 12 }} />
                    <Tooltip formatter={(v) => percent(Number(v))} />
                    <Bar dataKey="rate" name="Rate" fill="#13627a" isAnimationActive={false}>
                      <ErrorBar dataKey="whisker" width={6} stroke="#15201b" />
                    </Bar>
                  </BarChart>
                </ResponsiveContainer>
              </div>
            </figure>
            <Table caption={`Contamination rate by ${factorNames[by]}`}>
              <thead>
                <tr>
                  <th scope="col" className={th}>
                    {factorLabels[by]}
                  </th>
                  <th scope="col" className={`${th} ${num}`}>
                    Jars
                  </th>
                  <th scope="col" className={`${th} ${num}`}>
                    Contaminated
                  </th>
                  <th scope="col" className={`${th} ${num}`}>
                    Incubating
                  </th>
                  <th scope="col" className={`${th} ${num}`}>
                    Rate
                  </th>
                  <th scope="col" className={`${th} ${num}`}>
                    95 % interval
                  </th>
                </tr>
              </thead>
              <tbody>
                {data.rows.map((r) => (
                  <tr key={r.level}>
                    <th scope="row" className={`${td} font-semibold`}>
                      {r.level}
                    </th>
                    <td className={`${td} ${num}`}>
                      <JarsLink
                        factor={by}
                        level={r.level}
                        period={period}
                        label={`${countOf(r.jars, 'jar')} of ${r.level}`}
                      >
                        {r.jars}
                      </JarsLink>
                    </td>
                    <td className={`${td} ${num}`}>
                      <JarsLink
                        factor={by}
                        level={r.level}
                        only="contaminated"
                        period={period}
                        label={`${countOf(r.contaminated, 'contaminated jar')} of ${r.level}`}
                      >
                        {r.contaminated}
                      </JarsLink>
                    </td>
                    <td className={`${td} ${num}`}>{r.incubating}</td>
                    <td className={`${td} ${num} font-semibold`}>{percent(r.rate)}</td>
                    <td className={`${td} ${num}`}>{interval(r.ci95)}</td>
                  </tr>
                ))}
                <tr className="bg-surface-sunken">
                  <th scope="row" className={`${td} font-semibold`}>
                    All jars
                  </th>
                  <td className={`${td} ${num}`}>{data.overall.jars}</td>
                  <td className={`${td} ${num}`}>{data.overall.contaminated}</td>
                  <td className={`${td} ${num}`}>{data.overall.incubating}</td>
                  <td className={`${td} ${num} font-semibold`}>{percent(data.overall.rate)}</td>
                  <td className={`${td} ${num}`}>{interval(data.overall.ci95)}</td>
                </tr>
              </tbody>
            </Table>
            <TablePager total={data.total} page={page} pageSize={pageSize} />
            {data.notRecorded > 0 && (
              <p className="mt-3 text-sm text-muted">
                {data.notRecorded} jars in this period do not record a {factorNames[by]} and are left out of the rows
                (they are in “All jars”).
              </p>
            )}
          </>
        )}
      </LoadState>
    </>
  );
}
