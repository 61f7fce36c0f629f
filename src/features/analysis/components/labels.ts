import { factorLabel, factors, type Factor } from '../../../../shared/enums';

export const factorLabels = Object.fromEntries(factors.map((f) => [f, factorLabel(f)])) as Record<Factor, string>;

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
