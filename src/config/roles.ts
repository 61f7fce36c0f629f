import { roles, type Role } from '../../shared/enums';

export const allRoles: readonly Role[] = roles;

export const roleLabels: Record<Role, string> = {
  technician: 'Technician',
  supervisor: 'Supervisor',
  trainer: 'Trainer',
  admin: 'Administrator',
};

export const roleSummaries: Record<Role, string> = {
  technician:
    'You record grain prep, cook runs, cultures, inoculation sessions and jars, check jars on the shelf and flag the ones that turn.',
  supervisor:
    'You review incidents, set their verdicts, assign corrective actions and follow the contamination rate week by week.',
  trainer:
    'You keep the lab’s procedures, link incidents to the steps that were likely missed and record who was trained.',
  admin: 'You manage the people who use Asepta and the lab’s settings.',
};

/** Which roles may open each screen; navigation and route guards read the same list. */
export const access = {
  home: allRoles,
  analysis: allRoles,
  weeklyTable: ['supervisor'],
  labSettings: ['admin'],
  account: allRoles,
  users: ['admin'],
  historyImport: ['supervisor', 'admin'],
  cookRuns: allRoles,
  cultures: allRoles,
  sessions: allRoles,
  grain: allRoles,
  incidents: allRoles,
  actions: allRoles,
  flagJar: ['technician', 'supervisor'],
  procedures: allRoles,
  training: ['supervisor', 'trainer', 'admin'],
  mailPreferences: allRoles,
  sentMail: ['admin'],
} satisfies Record<string, readonly Role[]>;

/** Who may write the production record; trainers read it (DESIGN.md §2). The server checks the same. */
export const productionRoles: Record<'write' | 'changeCultureState' | 'addGrain', readonly Role[]> = {
  write: ['technician', 'supervisor', 'admin'],
  changeCultureState: ['supervisor', 'admin'],
  addGrain: ['admin'],
};
