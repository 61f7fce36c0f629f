import type { Role } from '../../../shared/enums';
import { roleLabels } from '../../config/roles';
import { EmptyState } from '../ui/empty-state';
import { StartPageLink } from './start-page-link';

export function NotForYourRole({ role, allowed }: { role: Role; allowed: readonly Role[] }) {
  const who = allowed.map((r) => roleLabels[r].toLowerCase()).join(', ');
  return (
    <EmptyState
      titleAs="h1"
      icon="alert"
      title="This screen is not available for your role."
      action={<StartPageLink />}
    >
      Your role is {roleLabels[role].toLowerCase()}; this screen is for {who}. If you need it for your work, ask an
      administrator to change your role.
    </EmptyState>
  );
}
