import type { JarStatus } from '../../../../shared/enums';
import { Badge, type BadgeTone } from '../../../components/ui/badge';

export const jarStatusLabels: Record<JarStatus, string> = {
  incubating: 'Incubating',
  colonised: 'Colonised',
  contaminated: 'Contaminated',
  'on-hold': 'On hold',
  discarded: 'Discarded',
  released: 'Released',
};

const tones: Record<JarStatus, BadgeTone> = {
  incubating: 'accent',
  colonised: 'ok',
  contaminated: 'danger',
  'on-hold': 'warn',
  discarded: 'neutral',
  released: 'neutral',
};

export function JarStatusBadge({ status }: { status: JarStatus }) {
  return <Badge tone={tones[status]}>{jarStatusLabels[status]}</Badge>;
}
