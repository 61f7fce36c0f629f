import type { IncidentStatus, Verdict } from '../../../../shared/enums';
import { Badge } from '../../../components/ui/badge';
import { statusLabels, statusTones, verdictLabels, verdictTones } from '../labels';

export function IncidentBadges({
  status,
  verdict,
  voided,
}: {
  status: IncidentStatus;
  verdict: Verdict;
  voided: boolean;
}) {
  if (voided) return <Badge tone="neutral">Voided</Badge>;
  return (
    <span className="inline-flex flex-wrap gap-1">
      <Badge tone={statusTones[status]}>{statusLabels[status]}</Badge>
      <Badge tone={verdictTones[verdict]}>{verdictLabels[verdict]}</Badge>
    </span>
  );
}
