import type { CookRunDto } from '../../../../shared/schemas/cook-runs';
import { Badge } from '../../../components/ui/badge';

export const formatF0 = (f0: number | null) => (f0 === null ? '—' : f0.toFixed(1));

type Judged = Pick<CookRunDto, 'f0' | 'f0Label' | 'f0UpperBound' | 'judgedBy' | 'belowTarget'>;

/** F0 always travels with where it came from: a chamber log or an estimate can only overstate the jar centre's dose. */
export function LethalityFigure({ run }: { run: Judged }) {
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      <span className="font-medium tabular-nums">
        F0 {run.f0UpperBound ? '≤ ' : ''}
        {formatF0(run.f0)}
      </span>
      {run.f0Label && <span className="text-sm text-muted">{run.f0Label}</span>}
      {run.belowTarget && <Badge tone="danger">Below target</Badge>}
      {run.judgedBy === 'unjudged' && <Badge tone="warn">No container minimum</Badge>}
    </span>
  );
}
