import { factors, type Factor } from '../../../../shared/enums';

export const factorLabels: Record<Factor, string> = {
  grain: 'Grain',
  cookRun: 'Cook run',
  cookMinutes: 'Minutes at pressure',
  session: 'Session',
  operator: 'Operator',
  culture: 'Culture',
  week: 'ISO week',
  prepBatch: 'Prep batch',
  workspace: 'Workspace',
  room: 'Incubation room',
};

export const factorOptions = factors.map((f) => ({ value: f, label: factorLabels[f] }));

const percentFormat = new Intl.NumberFormat(undefined, {
  style: 'percent',
  minimumFractionDigits: 1,
  maximumFractionDigits: 1,
});

export const percent = (value: number | null | undefined) =>
  value === null || value === undefined || Number.isNaN(value) ? '—' : percentFormat.format(value);

export const interval = (ci: readonly [number | null, number | null]) => `${percent(ci[0])} – ${percent(ci[1])}`;

export function formatP(p: number): string {
  if (p === 0) return '< 1e-300';
  if (p < 0.001) return p.toExponential(1);
  return p.toFixed(3);
}

export const ratio = (v: number) => (Number.isFinite(v) ? v.toFixed(2) : '—');
