import type { Role } from '../../shared/enums';
import type { IconName } from '../components/ui/icon';
import { paths } from './paths';
import { access } from './roles';

export interface NavItem {
  /** Stable key, also used for test ids. */
  id: string;
  label: string;
  to: string;
  roles: readonly Role[];
  icon?: IconName;
  /** One line for the start-page tile. */
  description?: string;
  /** Match the path exactly (the start page would otherwise match everything). */
  end?: boolean;
}

// Order here is the order on screen; add new screens above Account, which stays last.
export const navigation: NavItem[] = [
  { id: 'home', label: 'Home', to: paths.home.to(), roles: access.home, icon: 'home', end: true },
  {
    id: 'users',
    label: 'Users',
    to: paths.users.to(),
    roles: access.users,
    icon: 'users',
    description: 'Create accounts, change roles and deactivate people who have left.',
  },
  {
    id: 'account',
    label: 'Account',
    to: paths.account.to(),
    roles: access.account,
    icon: 'account',
    description: 'Your details and your password.',
  },
];

export function navigationFor(role: Role): NavItem[] {
  return navigation.filter((item) => item.roles.includes(role));
}
