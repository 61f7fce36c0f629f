import { useQuery } from '@tanstack/react-query';
import type { ProcedureStepDto } from '../../../../shared/schemas/procedures';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { proceduresQueries } from '../api/procedures-queries';
import { StepLinksList } from './step-links-list';

const pct = (rate: number | null) => (rate === null ? '–' : `${(rate * 100).toFixed(1)} %`);

export function StepCard({ step, canLink, onLink }: { step: ProcedureStepDto; canLink: boolean; onLink: () => void }) {
  const stats = useQuery(proceduresQueries.stepStats(step.id));
  const s = stats.data;
  return (
    <li className="rounded-lg border border-line bg-surface-raised p-4" data-testid={`step-${step.position}`}>
      <p className="font-semibold">
        {step.position}. {step.text}
      </p>
      {step.caution && (
        <Notice tone="warn" className="mt-2">
          {step.caution}
        </Notice>
      )}
      <dl className="mt-3 grid gap-x-6 gap-y-1 text-sm sm:grid-cols-2">
        <div>
          <dt className="inline text-muted">Incidents linked: </dt>
          <dd className="inline font-medium" data-testid="incidents-linked">
            {s?.incidentsLinked ?? step.incidentsLinked}
          </dd>
        </div>
        {s && (
          <>
            <div>
              <dt className="inline text-muted">Ticked: </dt>
              <dd className="inline">
                {s.ticked.contaminated} of {s.ticked.jars} jars contaminated ({pct(s.ticked.rate)})
              </dd>
            </div>
            <div>
              <dt className="inline text-muted">Not ticked: </dt>
              <dd className="inline">
                {s.notTicked.contaminated} of {s.notTicked.jars} jars contaminated ({pct(s.notTicked.rate)})
              </dd>
            </div>
            <div>
              <dt className="inline text-muted">Fisher’s exact p: </dt>
              <dd className="inline">{s.pValue === null ? 'needs jars in both groups' : s.pValue.toPrecision(3)}</dd>
            </div>
          </>
        )}
      </dl>
      <StepLinksList stepId={step.id} canLink={canLink} />
      {canLink && (
        <Button variant="secondary" className="mt-3" onClick={onLink}>
          Link an incident to step {step.position}
        </Button>
      )}
    </li>
  );
}
