import { Link } from 'react-router';
import type { Role } from '../../../shared/enums';
import { paths } from '../../config/paths';
import { roleLabels } from '../../config/roles';
import { buttonClasses } from '../ui/button';
import { EmptyState } from '../ui/empty-state';

export function NotForYourRole({ role, allowed }: { role: Role; allowed: readonly Role[] }) {
  const who = allowed.map((r) => roleLabels[r].toLowerCase()).join(', ');
  return (
    <EmptyState
      titleAs="h1"
      icon="alert"
      title="This screen is not available for your role."
      action={
        <Link to={paths.home.to()} className={buttonClasses('primary')}>
          Go to the start page
        </Link>
      }
    >
      Your role is {roleLabels[role].toLowerCase()}; this screen is for {who}. If you need it for your work, ask an
      administrator to change your role.
    </EmptyState>
  );
}
