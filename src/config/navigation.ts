import type { Role } from '../../shared/enums';
import type { IconName } from '../components/ui/icon';
import { paths } from './paths';
import { access, allRoles, productionRoles } from './roles';

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
  /** Roles for whom this screen is one of the few on the phone's bottom bar, in nav order. */
  barFor?: readonly Role[];
}

// Order here is the order on screen; add new screens above Account, which stays last.
export const navigation: NavItem[] = [
  { id: 'home', label: 'Home', to: paths.home.to(), roles: access.home, icon: 'home', end: true },
  {
    id: 'weekly-table',
    label: 'This week',
    to: paths.analysisWeekly.to(),
    roles: access.weeklyTable,
    description: 'The last twelve ISO weeks: jars, contamination and the p-chart, per grain and overall.',
    icon: 'calendar',
  },
  {
    id: 'analysis',
    label: 'Analysis',
    to: paths.analysisCauses.to(),
    roles: access.analysis,
    description: 'Likely causes, rates, cross-tables, colonisation time and cook lethality.',
    icon: 'chart',
  },
  {
    id: 'users',
    label: 'Users',
    to: paths.users.to(),
    roles: access.users,
    icon: 'users',
    description: 'Create accounts, change roles and deactivate people who have left.',
    barFor: ['admin'],
  },
  {
    id: 'cook-runs',
    label: 'Cook runs',
    to: paths.cookRuns.to(),
    roles: access.cookRuns,
    description: 'Sterilisation cycles, temperature logs and each run’s lethality (F0).',
    icon: 'flame',
  },
  {
    id: 'cultures',
    label: 'Cultures',
    to: paths.cultures.to(),
    roles: access.cultures,
    description: 'Syringes and liquid cultures: quarantine, release, agar tests.',
    icon: 'flask',
  },
  {
    id: 'sessions',
    label: 'Sessions',
    to: paths.sessions.to(),
    roles: access.sessions,
    description: 'Inoculation sessions: who, where, and the checklist they followed.',
    icon: 'syringe',
  },
  {
    id: 'grain',
    label: 'Grain',
    to: paths.grain.to(),
    roles: access.grain,
    description: 'Grain lots as received and the prep batches soaked and simmered from them.',
    icon: 'grain',
  },
  {
    id: 'jars',
    label: 'Jars',
    to: paths.jars.to(),
    roles: allRoles,
    description: 'Every jar with its status, place and story; labels, lineage and holds.',
    icon: 'jar',
  },
  {
    id: 'shelf-walk',
    label: 'Shelf walk',
    to: paths.shelfWalk.to(),
    roles: productionRoles.write,
    description: 'Go along a shelf and mark each jar clean, colonised or shaken with one tap.',
    icon: 'shelf',
    barFor: ['technician'],
  },
  {
    id: 'flag-jar',
    label: 'Flag a jar',
    to: paths.flagJar.to(),
    roles: access.flagJar,
    icon: 'alert',
    description: 'A jar has turned: record it with a photo in under half a minute.',
    barFor: ['technician', 'supervisor'],
  },
  {
    id: 'incidents',
    label: 'Incidents',
    to: paths.incidents.to(),
    roles: access.incidents,
    icon: 'inbox',
    description: 'The incident register: review, verdicts, corrective actions and history.',
    end: true,
    barFor: ['supervisor', 'trainer'],
  },
  {
    id: 'actions',
    label: 'Actions',
    to: paths.actions.to(),
    roles: access.actions,
    icon: 'check',
    description: 'Every corrective action: who owns it, when it is due, and how it was verified.',
  },
  {
    id: 'history-import',
    label: 'History import',
    to: paths.historyImport.to(),
    roles: access.historyImport,
    description: 'Bring past production in from a spreadsheet: jars, cook runs, sessions, cultures and outcomes.',
    icon: 'upload',
  },
  {
    id: 'procedures',
    label: 'Procedures',
    to: paths.procedures.to(),
    roles: access.procedures,
    description: 'The lab’s written methods, step by step, with the incidents linked to each step.',
    icon: 'list',
    barFor: ['trainer'],
  },
  {
    id: 'training',
    label: 'Training',
    to: paths.training.to(),
    roles: access.training,
    icon: 'users',
    description: 'Who is trained on the current version, their incidents, and retraining requests.',
  },
  {
    id: 'sent-mail',
    label: 'Sent mail',
    to: paths.sentMail.to(),
    roles: access.sentMail,
    description: 'Every e-mail Asepta sent, and the weekly digest on demand.',
    icon: 'mail',
  },
  {
    id: 'mail',
    label: 'Mail',
    to: paths.mailPreferences.to(),
    roles: access.mailPreferences,
    description: 'Choose which e-mails you get.',
    icon: 'mail',
  },
  {
    id: 'lab-settings',
    label: 'Lab settings',
    to: paths.labSettings.to(),
    roles: access.labSettings,
    description: 'Cook-duration buckets, the lethality target, the observation window and alert thresholds.',
    icon: 'settings',
    barFor: ['admin'],
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

/** The role's screens with the ones it reaches for most (its phone-bar screens) first. */
export function prioritisedFor(role: Role): NavItem[] {
  const items = navigationFor(role);
  const first = items.filter((i) => i.id === 'home' || i.barFor?.includes(role));
  return [...first, ...items.filter((i) => !first.includes(i))];
}
