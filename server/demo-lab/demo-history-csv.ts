import type { DemoPlan } from './demo-plan';

const cell = (v: string) => (/[",\r\n]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v);

/** The plan as a history file, the same format a lab would upload. */
export function planToCsv(plan: DemoPlan): string {
  const header =
    'jar_label,grain,cook_run,cook_minutes,inoculated_on,session,operator,culture,outcome,contaminant,found_on';
  const lines = plan.jars.map((j) =>
    [
      j.label,
      j.grain,
      j.run.code,
      String(j.run.minutes),
      j.session.heldOn,
      j.session.code,
      j.session.operator,
      j.culture,
      j.contaminant ? 'contaminated' : 'clean',
      j.contaminant ?? '',
      j.foundOn ?? '',
    ]
      .map(cell)
      .join(','),
  );
  return [header, ...lines].join('\n') + '\n';
}
