import type { CookRunDetailDto } from '../../../../shared/schemas/cook-runs';
import { Notice } from '../../../components/ui/notice';
import { formatF0 } from './lethality-figure';

const earlySigns = 'Watch its jars for early bacterial or pin-mould growth.';

/** The run's verdict by DESIGN §4.6: a jar-centre log against the F0 target, else minutes against the container's minimum. */
export function CookVerdictPanel({ run }: { run: CookRunDetailDto }) {
  const centre = run.judgedBy === 'centre-probe';
  return (
    <section aria-label="Lethality" className="rounded-lg border border-line bg-surface-raised p-4">
      {centre ? (
        <>
          <p className="text-3xl font-semibold tabular-nums">F0 {formatF0(run.f0)} min</p>
          <p className="mt-1 font-medium">From a probe at the centre of a jar</p>
        </>
      ) : (
        <>
          <p className="text-3xl font-semibold tabular-nums">{run.minutesAtPressure} min at pressure</p>
          <p className="mt-1 font-medium">
            {run.minimumMinutes === null
              ? `No minimum is set for “${run.container ?? 'no container'}”.`
              : `The lab’s minimum for a ${run.container}: ${run.minimumMinutes} min.`}
          </p>
          {run.f0 !== null && (
            <p className="mt-1 text-muted">
              F0 ≤ {formatF0(run.f0)} min —{' '}
              {run.f0Source === 'log'
                ? 'from a chamber log'
                : `as if the whole hold were at ${run.sterilisingTemperatureC?.toFixed(1)} °C, the steam temperature at this gauge pressure and altitude`}
              . An upper bound: the centre of a jar of wet grain lags far behind the chamber, so this figure cannot pass
              a run. Only a probe log from the jar centre is held to the F0 target of {run.lethalityTarget}.
            </p>
          )}
        </>
      )}
      {run.belowTarget ? (
        <Notice
          tone="danger"
          className="mt-3"
          title={
            centre
              ? `Below the lab’s target of F0 ${run.lethalityTarget}`
              : `Shorter than the lab’s minimum of ${run.minimumMinutes} min for this container`
          }
        >
          Jars from this run may not have been sterilised through. {earlySigns}
        </Notice>
      ) : run.judgedBy === 'unjudged' ? (
        <Notice tone="warn" className="mt-3" title="This run is not judged">
          Without a jar-centre log and without a minimum for its container nothing here says it sterilised. An admin
          sets container minimums in the lab settings.
        </Notice>
      ) : (
        <p className="mt-2 text-sm text-muted">
          {centre ? `Lab target: F0 ≥ ${run.lethalityTarget}.` : `Meets the lab’s minimum for this container.`}
        </p>
      )}
    </section>
  );
}
