import type { Role } from '../../shared/enums';

/** Invented staff of the demo lab; the four sign-in names are fixed by DESIGN.md §5. */
export const demoPassword = 'asepta-demo';

export const demoAccounts: { username: string; displayName: string; role: Role; email: string }[] = [
  { username: 'technician', displayName: 'Tamsin Oakridge', role: 'technician', email: 'technician@demo-lab.invalid' },
  { username: 'supervisor', displayName: 'Ilario Penwick', role: 'supervisor', email: 'supervisor@demo-lab.invalid' },
  { username: 'trainer', displayName: 'Maren Holloway', role: 'trainer', email: 'trainer@demo-lab.invalid' },
  { username: 'admin', displayName: 'Desmond Quarrie', role: 'admin', email: 'admin@demo-lab.invalid' },
];

/** Who inoculates in the demo lab: the two demo users by display name, and staff without an account. */
export const demoOperators = {
  technician: 'Tamsin Oakridge',
  supervisor: 'Ilario Penwick',
  staff: ['Noor Halvey', 'Bexley Strand'],
  /** A relief technician, behind the sloppy week (seed/planted-problems.ts). */
  relief: 'Ferris Quell',
} as const;
