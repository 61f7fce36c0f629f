import { useQuery } from '@tanstack/react-query';
import { Fact, Facts } from '../../../components/ui/facts';
import { LoadFailed } from '../../../components/ui/load-failed';
import { BackLink } from '../../../components/ui/text-link';
import { PageHeader } from '../../../components/ui/page-header';
import { FullPageSpinner } from '../../../components/ui/spinner';
import { paths } from '../../../config/paths';
import { formatDate, formatDateTime } from '../../../lib/format';
import { cookRunsQueries } from '../api/cook-runs-queries';
import { CookVerdictPanel } from './cook-verdict-panel';
import { PressureCaution } from './pressure-caution';
import { ReadingsPanel } from './readings-panel';

const orDash = (v: string | number | null) => (v === null || v === '' ? '—' : v);

export function CookRunDetail({ id, canWrite }: { id: number; canWrite: boolean }) {
  const detail = useQuery(cookRunsQueries.detail(id));
  if (detail.isPending) return <FullPageSpinner label="Loading cook run" />;
  if (detail.error) {
    return (
      <LoadFailed
        title="The cook run could not be loaded."
        error={detail.error}
        onRetry={() => void detail.refetch()}
      />
    );
  }
  const run = detail.data;

  return (
    <>
      <BackLink to={paths.cookRuns.to()}>Cook runs</BackLink>
      <PageHeader title={`Cook run ${run.code}`} description={run.vessel ?? undefined} />
      <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
        <div className="flex flex-col gap-6">
          <CookVerdictPanel run={run} />
          <section aria-label="Cycle" className="rounded-lg border border-line bg-surface-raised p-4">
            <Facts>
              <Fact term="Date">{run.cookedOn ? formatDate(run.cookedOn) : '—'}</Fact>
              <Fact term="Start time">{run.startedAt ? formatDateTime(run.startedAt) : '—'}</Fact>
              <Fact term="Container">{orDash(run.container)}</Fact>
              <Fact term="Minutes at pressure">{run.minutesAtPressure}</Fact>
              <Fact term="Gauge">
                {run.gaugeKPa === null
                  ? 'not read (103.4 kPa assumed)'
                  : `${run.gaugeKPa.toFixed(1)} kPa · ${run.gaugePsi?.toFixed(2)} psi`}
              </Fact>
              <Fact term="Steam temperature">{run.sterilisingTemperatureC?.toFixed(1)} °C</Fact>
              <Fact term="Venting minutes">{orDash(run.ventingMinutes)}</Fact>
              <Fact term="Site altitude">{run.altitudeM} m</Fact>
              <Fact term="Load count">{orDash(run.loadCount)}</Fact>
              <Fact term="Operator">{orDash(run.operatorName)}</Fact>
            </Facts>
            {run.notes && <p className="mt-4 whitespace-pre-line">{run.notes}</p>}
          </section>
          <ReadingsPanel run={run} canWrite={canWrite} />
        </div>
        <aside>
          <PressureCaution />
        </aside>
      </div>
    </>
  );
}
