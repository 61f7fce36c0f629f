import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import type { LethalityRow } from '../../../../shared/schemas/analysis';
import { Badge } from '../../../components/ui/badge';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { cautionFootnote, cautions } from '../../../config/cautions';
import { analysisQueries, csvUrl, readPeriod } from '../api/analysis-queries';
import { AnalysisTabs, CsvLink, LoadState, PeriodPicker, Table, num, td, th } from './analysis-frame';
import { percent } from './labels';

function source(r: LethalityRow): string {
  if (r.f0Source === 'log') return 'temperature log';
  if (r.f0Source === 'estimate')
    return r.assumedGauge ? 'estimate, assuming 15 psi (no gauge recorded)' : 'estimate (upper bound)';
  return 'not enough recorded';
}

/** Cook runs with their F0, low ones flagged against the lab's target. */
export function LethalityScreen() {
  const [params] = useSearchParams();
  const period = readPeriod(params);
  const lethality = useQuery(analysisQueries.lethality(period));
  const data = lethality.data;
  const pressure = cautions.find((c) => c.id === 'pressure');

  return (
    <>
      <PageHeader
        title="Cook lethality"
        description="F0 of each cook run: minutes at 121.1 °C its cycle is worth (z = 10 °C). Without a temperature log it is estimated from minutes at the steam temperature of the run’s pressure — an upper bound, since the centre of a jar lags the chamber."
        actions={<CsvLink href={csvUrl('lethality', { ...period })} />}
      />
      <AnalysisTabs />
      {pressure && (
        <Notice tone="warn" title={pressure.title} className="mb-6">
          <p>{pressure.text}</p>
          <p className="mt-1 text-sm text-muted">{cautionFootnote}</p>
        </Notice>
      )}
      <PeriodPicker period={period} />
      <LoadState
        isPending={lethality.isPending}
        error={lethality.error}
        onRetry={() => void lethality.refetch()}
        isEmpty={!data || data.runs.length === 0}
        emptyTitle="No cook runs in this period."
      >
        {data && (
          <>
            <p className="mb-3">
              The lab’s target is F0 ≥ <strong>{data.target}</strong> min;{' '}
              <strong>{data.runs.filter((r) => r.belowTarget).length}</strong> of {data.runs.length} runs fall below it.
            </p>
            <Table caption="Cook runs with F0">
              <thead>
                <tr>
                  <th scope="col" className={th}>
                    Cook run
                  </th>
                  <th scope="col" className={th}>
                    Cooked on
                  </th>
                  <th scope="col" className={th}>
                    Container
                  </th>
                  <th scope="col" className={`${th} ${num}`}>
                    Minutes at pressure
                  </th>
                  <th scope="col" className={`${th} ${num}`}>
                    F0 (min)
                  </th>
                  <th scope="col" className={th}>
                    From
                  </th>
                  <th scope="col" className={`${th} ${num}`}>
                    Contaminated
                  </th>
                </tr>
              </thead>
              <tbody>
                {data.runs.map((r) => (
                  <tr key={r.cookRun} className={r.belowTarget ? 'bg-danger-soft' : undefined}>
                    <th scope="row" className={`${td} font-semibold`}>
                      {r.cookRun}
                    </th>
                    <td className={td}>{r.cookedOn ?? '—'}</td>
                    <td className={td}>{r.container ?? '—'}</td>
                    <td className={`${td} ${num}`}>{r.minutesAtPressure}</td>
                    <td className={`${td} ${num}`}>
                      <span className="font-semibold">{r.f0 === null ? '—' : r.f0.toFixed(1)}</span>{' '}
                      {r.belowTarget && <Badge tone="danger">Below target</Badge>}
                    </td>
                    <td className={`${td} text-sm`}>{source(r)}</td>
                    <td className={`${td} ${num}`}>
                      {r.contaminated}/{r.jars} <span className="text-sm text-muted">{percent(r.rate)}</span>
                    </td>
                  </tr>
                ))}
              </tbody>
            </Table>
          </>
        )}
      </LoadState>
    </>
  );
}
