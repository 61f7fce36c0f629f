import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import { PageHeader } from '../../../components/ui/page-header';
import { Select } from '../../../components/ui/select';
import { Pager } from '../../../components/ui/table/pager';
import { pageSizes, patchParams, readTableState } from '../../../lib/list-params';
import { analysisQueries, csvUrl, readFactor, readPeriod } from '../api/analysis-queries';
import { JarsLink } from './jars-link';
import { AnalysisTabs, CsvLink, LoadState, PeriodPicker, Table, num, td, th } from './analysis-frame';
import { factorLabels, factorOptions, interval, percent } from './labels';

/** Column pages stay narrow: a grid wider than a screen cannot be read a row at a time. */
const colPageSizes = [10, 20, 40] as const;

function whole(value: string | null, fallback: number): number {
  const n = Number(value);
  return Number.isInteger(n) && n >= 1 ? n : fallback;
}

/** Two factors at once: a grid shaded by rate, with the counts in every cell. */
export function CrosstabScreen() {
  const [params, setParams] = useSearchParams();
  const period = readPeriod(params);
  const rows = readFactor(params, 'rows', 'grain');
  const colsWanted = readFactor(params, 'cols', 'cookMinutes');
  const cols = colsWanted === rows ? (rows === 'grain' ? 'cookMinutes' : 'grain') : colsWanted;
  const { page, pageSize } = readTableState(params, []);
  const colPage = whole(params.get('colPage'), 1);
  const colPageSize = whole(params.get('colPageSize'), colPageSizes[1]);
  const table = useQuery(analysisQueries.crosstab(rows, cols, period, { page, pageSize, colPage, colPageSize }));
  const data = table.data;
  const cells = new Map(data?.cells.map((c) => [`${c.row}\u0000${c.col}`, c]));
  const top = Math.max(0.0001, ...(data?.cells.map((c) => c.rate ?? 0) ?? [0]));

  return (
    <>
      <PageHeader
        title="Cross-table"
        description="Contamination for every pair of levels of two factors — for example grain against minutes at pressure."
        actions={<CsvLink href={csvUrl('crosstab', { rows, cols, ...period })} />}
      />
      <AnalysisTabs />
      <PeriodPicker period={period}>
        <Select
          label="Rows"
          options={factorOptions}
          value={rows}
          onChange={(e) => setParams(patchParams(params, { rows: e.target.value, colPage: undefined }))}
          className="w-56"
        />
        <Select
          label="Columns"
          options={factorOptions.filter((o) => o.value !== rows)}
          value={cols}
          onChange={(e) => setParams(patchParams(params, { cols: e.target.value, colPage: undefined }))}
          className="w-56"
        />
      </PeriodPicker>
      <LoadState
        query={table}
        isEmpty={!data || (data.rowPage.total === 0 && data.colPage.total === 0)}
        emptyTitle="No jars in this period record both factors."
      >
        {data && (
          <>
            <Table caption={`${factorLabels[rows]} by ${factorLabels[cols]}`}>
              <thead>
                <tr>
                  <th scope="col" className={th}>
                    {factorLabels[rows]} \ {factorLabels[cols]}
                  </th>
                  {data.cols.map((c) => (
                    <th key={c} scope="col" className={`${th} ${num}`}>
                      {c}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {data.rows.map((r) => (
                  <tr key={r}>
                    <th scope="row" className={`${td} font-semibold`}>
                      {r}
                    </th>
                    {data.cols.map((c) => {
                      const cell = cells.get(`${r}\u0000${c}`);
                      if (!cell)
                        return (
                          <td key={c} className={`${td} ${num} text-muted`}>
                            —
                          </td>
                        );
                      // Shade by rate relative to the worst cell; at most 0.58 keeps dark text above 4.5:1 (WCAG 1.4.3).
                      const alpha = 0.08 + 0.5 * ((cell.rate ?? 0) / top);
                      return (
                        <td
                          key={c}
                          className={`${td} ${num}`}
                          style={{ backgroundColor: `rgb(164 38 28 / ${alpha.toFixed(2)})` }}
                          title={`95 % interval ${interval(cell.ci95)}`}
                        >
                          <span className="font-semibold">{percent(cell.rate)}</span>
                          <span className="block text-sm">
                            <JarsLink
                              factor={rows}
                              level={r}
                              factor2={cols}
                              level2={c}
                              period={period}
                              label={`Jars of ${r} and ${c}`}
                            >
                              {cell.contaminated}/{cell.jars}
                            </JarsLink>
                            {cell.incubating > 0 && ` · ${cell.incubating} incubating`}
                          </span>
                        </td>
                      );
                    })}
                  </tr>
                ))}
              </tbody>
            </Table>
            {data.rowPage.total > pageSizes[0] && (
              <Pager
                page={page}
                pageSize={pageSize}
                total={data.rowPage.total}
                noun={factorLabels[rows]}
                onChange={(patch) => setParams(patchParams(params, { colPage, ...patch }))}
              />
            )}
            {data.colPage.total > colPageSizes[0] && (
              <Pager
                page={colPage}
                pageSize={colPageSize}
                total={data.colPage.total}
                noun={factorLabels[cols]}
                sizes={colPageSizes}
                onChange={(patch) =>
                  setParams(
                    patchParams(params, { page, colPage: patch.page ?? 1, colPageSize: patch.pageSize ?? colPageSize }),
                  )
                }
              />
            )}
            <p className="mt-3 text-sm text-muted">
              Each cell: rate, then contaminated of jars. Darker cells have higher rates; hover a cell for its 95 %
              interval.
            </p>
          </>
        )}
      </LoadState>
    </>
  );
}
