import { useQuery } from '@tanstack/react-query';
import { Link, useNavigate, useSearchParams } from 'react-router';
import { Badge } from '../../../components/ui/badge';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { analysisQueries, csvUrl, readPeriod } from '../api/analysis-queries';
import { AnalysisTabs, CsvLink, LoadState, PeriodPicker, Table, nowrap, num, td, th } from './analysis-frame';
import { percent } from './labels';
import { JarsLink, jarsBehindPath } from './jars-link';
import { WeeklyChart } from './weekly-chart';
import './weekly-print.css';
import { countOf } from '../../../lib/count-text';

// Tighter cells than the other analysis tables: a week row with every grain must fit a 1366 px screen.
const thw = th.replace('px-3', 'px-1.5');
const tdw = td.replace('px-3', 'px-1.5');

/** The supervisor's home: the last twelve ISO weeks, overall and per grain, with the p-chart. */
export function WeeklyScreen({ compact = false }: { compact?: boolean }) {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const period = compact ? { from: undefined, to: undefined } : readPeriod(params);
  const weekly = useQuery(analysisQueries.weekly(period));
  const data = weekly.data;
  const grains = [...new Set(data?.weeks.flatMap((w) => w.grains.map((g) => g.grain)) ?? [])].sort();
  const flagged = data?.weeks.filter((w) => w.outOfControl) ?? [];
  // The period the table shows, so a drill-down counts the same jars.
  const shown = { from: data?.from, to: data?.to };
  const aboveTarget = data?.weeks.filter((w) => w.aboveTarget) ?? [];
  // The settled weeks with the highest rates, so the worst ones lead even when none crosses its limit.
  const worst = [...(data?.weeks.filter((w) => !w.provisional && w.contaminated > 0) ?? [])]
    .sort((a, b) => b.rate - a.rate)
    .slice(0, 3);

  return (
    <section aria-labelledby="weekly-title" className="weekly-print">
      {compact ? (
        <div className="mb-4 flex flex-wrap items-end justify-between gap-3">
          <h2 id="weekly-title" className="text-xl font-semibold">
            Contamination, week by week
          </h2>
          <Link to={paths.analysisWeekly.to()} className="font-medium text-accent underline">
            Open the weekly table
          </Link>
        </div>
      ) : (
        <>
          <PageHeader
            title="Weekly table"
            description="Jars by the ISO week they were inoculated in: how many, how many turned, and how many are still incubating."
            actions={
              <>
                <button
                  type="button"
                  className="rounded-md border-2 border-line-strong px-4 py-2 font-semibold"
                  onClick={() => window.print()}
                >
                  Print
                </button>
                <CsvLink href={csvUrl('weekly', { ...period })} />
              </>
            }
          />
          <h2 id="weekly-title" className="sr-only">
            Weekly table
          </h2>
          <AnalysisTabs />
          <PeriodPicker period={period} />
        </>
      )}
      <LoadState
        query={weekly}
        isEmpty={!data || data.weeks.length === 0}
        emptyTitle="No jars were inoculated in these weeks."
      >
        {data && (
          <>
            <p className="mb-4 text-muted">
              {data.from} to {data.to}. A week is provisional while it holds jars younger than{' '}
              {data.observationWindowDays} days that have not turned.
              {flagged.length > 0 && (
                <strong className="ml-1 text-danger">Out of control: {flagged.map((w) => w.week).join(', ')}.</strong>
              )}
            </p>
            <p className="mb-4" data-testid="target-note">
              The lab accepts up to <strong>{percent(data.target)}</strong>. “In control” means as usual for this lab;
              “above target” means more than the lab accepts, and a week can be both.
              {aboveTarget.length > 0 && (
                <strong className="ml-1 text-danger">Above target: {aboveTarget.map((w) => w.week).join(', ')}.</strong>
              )}
            </p>
            {worst.length > 0 && (
              <p className="mb-4" data-testid="worst-weeks">
                <span className="font-semibold">Highest settled weeks: </span>
                {worst.map((w) => `${w.week} (${percent(w.rate)}, ${w.contaminated} of ${w.jars})`).join(' · ')}
              </p>
            )}
            {!compact && (
              <WeeklyChart
                data={data}
                onWeek={(week) => void navigate(jarsBehindPath({ factor: 'week', level: week, period: shown }))}
              />
            )}
            <Table caption="Contamination per ISO week">
              <thead>
                <tr>
                  <th scope="col" className={thw}>
                    Week
                  </th>
                  <th scope="col" className={`${thw} ${num}`}>
                    Jars
                  </th>
                  <th scope="col" className={`${thw} ${num}`}>
                    Contaminated
                  </th>
                  <th scope="col" className={`${thw} ${num}`}>
                    Incubating
                  </th>
                  <th scope="col" className={`${thw} ${num}`}>
                    Rate
                  </th>
                  <th scope="col" className={`${thw} ${num}`}>
                    Limits
                  </th>
                  <th scope="col" className={thw}>
                    Status
                  </th>
                  {grains.map((g) => (
                    <th key={g} scope="col" className={`${thw} ${num}`}>
                      {g}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {[...data.weeks].reverse().map((w) => (
                  <tr
                    key={w.week}
                    data-testid={`week-${w.week}`}
                    className={w.outOfControl ? 'bg-danger-soft' : undefined}
                  >
                    <th scope="row" className={`${tdw} ${nowrap} font-semibold`}>
                      {w.week}
                    </th>
                    <td className={`${tdw} ${num}`}>
                      <JarsLink
                        factor="week"
                        level={w.week}
                        period={shown}
                        label={`${countOf(w.jars, 'jar')} of ${w.week}`}
                      >
                        {w.jars}
                      </JarsLink>
                    </td>
                    <td className={`${tdw} ${num}`}>
                      <JarsLink
                        factor="week"
                        level={w.week}
                        only="contaminated"
                        period={shown}
                        label={`${countOf(w.contaminated, 'contaminated jar')} of ${w.week}`}
                      >
                        {w.contaminated}
                      </JarsLink>
                    </td>
                    <td className={`${tdw} ${num}`}>{w.incubating}</td>
                    <td className={`${tdw} ${num} font-semibold`}>{percent(w.rate)}</td>
                    <td className={`${tdw} ${num} text-muted`}>
                      {/* Two lines when the row is tight: lower – / upper. */}
                      <span className={nowrap}>{percent(w.lcl)} –</span>{' '}
                      <span className={nowrap}>{percent(w.ucl)}</span>
                    </td>
                    <td className={tdw}>
                      {/* Narrow on purpose: the longest badge wraps so the table keeps 1366 px without scrolling. */}
                      <div className="flex max-w-32 flex-wrap gap-1">
                        {w.outOfControl ? (
                          <Badge tone="danger">Out of control</Badge>
                        ) : w.belowLcl ? (
                          <Badge tone="ok" wrap>
                            Below the lower limit: a good week
                          </Badge>
                        ) : w.provisional ? (
                          <Badge tone="warn">Provisional</Badge>
                        ) : (
                          // Green would read as "fine": a week above the lab's target is not.
                          <Badge tone={w.aboveTarget ? 'neutral' : 'ok'}>In control</Badge>
                        )}
                        {w.aboveTarget && <Badge tone="danger">Above target</Badge>}
                      </div>
                    </td>
                    {grains.map((g) => {
                      const cell = w.grains.find((x) => x.grain === g);
                      return (
                        <td key={g} className={`${tdw} ${num}`}>
                          {cell ? (
                            <>
                              <JarsLink
                                factor="week"
                                level={w.week}
                                factor2="grain"
                                level2={g}
                                period={shown}
                                label={`${g} jars of ${w.week}`}
                              >
                                {percent(cell.rate)}
                              </JarsLink>{' '}
                              <span className="block text-sm text-muted">
                                ({cell.contaminated}/{cell.jars})
                              </span>
                            </>
                          ) : (
                            '—'
                          )}
                        </td>
                      );
                    })}
                  </tr>
                ))}
              </tbody>
            </Table>
            {data.pBar !== null && (
              <p className="mt-3 text-sm text-muted">
                Centre line p̄ = {percent(data.pBar)} over the settled weeks; limits are p̄ ± 3·√(p̄(1 − p̄)/n) for each
                week’s n, the lower one floored at 0 (Montgomery, Introduction to Statistical Quality Control, ch. 7).
              </p>
            )}
          </>
        )}
      </LoadState>
    </section>
  );
}
