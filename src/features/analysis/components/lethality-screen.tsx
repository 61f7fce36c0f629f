import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import type { LethalityRow } from '../../../../shared/schemas/analysis-lethality';
import { Badge } from '../../../components/ui/badge';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { cautionFootnote, cautions } from '../../../config/cautions';
import { Select } from '../../../components/ui/select';
import { patchParams, readTableState } from '../../../lib/list-params';
import { analysisQueries, csvUrl, readPeriod, type LethalityOnly } from '../api/analysis-queries';
import { AnalysisTabs, CsvLink, LoadState, PeriodPicker, Table, TablePager, num, td, th } from './analysis-frame';
import { percent } from './labels';
import { PlainTableHead } from '../../../components/ui/table/table-parts';

function source(r: LethalityRow): string {
  if (r.f0Source === 'log')
    return r.logPlacement === 'centre' ? 'probe at the jar centre' : 'chamber log (upper bound)';
  if (r.f0Source === 'estimate')
    return r.assumedGauge ? 'estimate, assuming 15 psi (no gauge recorded; upper bound)' : 'estimate (upper bound)';
  return 'not enough recorded';
}

function judgement(r: LethalityRow): string {
  if (r.judgedBy === 'centre-probe') return 'F0 against the target';
  if (r.judgedBy === 'minutes') return `minutes against ${r.minimumMinutes} min for the container`;
  return 'not judged: no minimum for this container';
}

const numberHeading = (label: string) => ({ label, className: `${th} ${num}` });
const runHeadings = [
  'Cook run',
  'Cooked on',
  'Container',
  numberHeading('Minutes at pressure'),
  numberHeading('F0 (min)'),
  'From',
  'Judged by',
  numberHeading('Contaminated'),
];

const onlyOptions = [
  { value: 'all', label: 'Every cook run' },
  { value: 'below', label: 'Below target only' },
];

const readOnly = (params: URLSearchParams): LethalityOnly => (params.get('only') === 'below' ? 'below' : 'all');

/** Cook runs with their F0, newest first and a page at a time, low ones flagged against the lab's target. */
export function LethalityScreen() {
  const [params, setParams] = useSearchParams();
  const period = readPeriod(params);
  const only = readOnly(params);
  const { page, pageSize } = readTableState(params, []);
  const lethality = useQuery(analysisQueries.lethality(period, only, page, pageSize));
  const data = lethality.data;
  const pressure = cautions.find((c) => c.id === 'pressure');

  return (
    <>
      <PageHeader
        title="Cook lethality"
        description="F0 of each cook run: minutes at 121.1 °C its cycle is worth (z = 10 °C). Only a log from a probe at the jar centre measures what the grain received; a chamber log or the estimate from the steam temperature is an upper bound, so those runs are judged by their minutes at pressure against the container’s minimum."
        actions={<CsvLink href={csvUrl('lethality', { ...period, only })} />}
      />
      <AnalysisTabs />
      {pressure && (
        <Notice tone="warn" title={pressure.title} className="mb-6">
          <p>{pressure.text}</p>
          <p className="mt-1 text-sm text-muted">{cautionFootnote}</p>
        </Notice>
      )}
      <PeriodPicker period={period}>
        <Select
          label="Show"
          options={onlyOptions}
          value={only}
          onChange={(e) => setParams(patchParams(params, { only: e.target.value, page: undefined }))}
          className="w-56"
        />
      </PeriodPicker>
      <LoadState
        query={lethality}
        isEmpty={!data || data.total === 0}
        emptyTitle={
          only === 'below' ? 'No cook run in this period falls below its target.' : 'No cook runs in this period.'
        }
      >
        {data && (
          <>
            <p className="mb-3">
              Jar-centre logs are held to F0 ≥ <strong>{data.target}</strong> min; other runs to the container minimums
              (
              {Object.entries(data.containerMinutes)
                .map(([name, minutes]) => `${name} ${minutes} min`)
                .join(', ')}
              ). <strong>{data.belowTarget}</strong> of {data.runsInPeriod} runs fall below their target.
            </p>
            <Table caption="Cook runs with F0">
              <thead>
                <PlainTableHead headings={runHeadings} cellClassName={th} />
              </thead>
              <tbody>
                {data.runs.map((r) => (
                  <tr key={r.cookRun} className={r.belowTarget ? 'bg-danger-soft' : undefined}>
                    <th scope="row" className={`${td} font-semibold whitespace-nowrap`}>
                      {r.cookRun}
                    </th>
                    <td className={`${td} whitespace-nowrap`}>{r.cookedOn ?? '—'}</td>
                    <td className={td}>{r.container ?? '—'}</td>
                    <td className={`${td} ${num}`}>{r.minutesAtPressure}</td>
                    <td className={`${td} ${num}`}>
                      <span className="font-semibold">
                        {r.f0 === null ? '—' : `${r.f0UpperBound ? '≤ ' : ''}${r.f0.toFixed(1)}`}
                      </span>
                    </td>
                    <td className={`${td} text-sm`}>{source(r)}</td>
                    <td className={`${td} text-sm`}>
                      {judgement(r)} {r.belowTarget && <Badge tone="danger">Below target</Badge>}
                    </td>
                    <td className={`${td} ${num}`}>
                      {r.contaminated}/{r.jars} <span className="text-sm text-muted">{percent(r.rate)}</span>
                    </td>
                  </tr>
                ))}
              </tbody>
            </Table>
            <TablePager total={data.total} page={page} pageSize={pageSize} />
          </>
        )}
      </LoadState>
    </>
  );
}
