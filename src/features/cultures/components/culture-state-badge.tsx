import type { CultureState } from '../../../../shared/enums';
import { Badge, type BadgeTone } from '../../../components/ui/badge';

const tones: Record<CultureState, BadgeTone> = { quarantined: 'warn', released: 'ok', retired: 'neutral' };
export const cultureStateLabels: Record<CultureState, string> = {
  quarantined: 'Quarantined',
  released: 'Released',
  retired: 'Retired',
};

export function CultureStateBadge({ state }: { state: CultureState }) {
  return <Badge tone={tones[state]}>{cultureStateLabels[state]}</Badge>;
}
