import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';

export type BadgeTone = 'neutral' | 'accent' | 'ok' | 'warn' | 'danger';

const tones: Record<BadgeTone, string> = {
  neutral: 'bg-surface-sunken text-ink border-line',
  accent: 'bg-accent-soft text-accent-strong border-accent/30',
  ok: 'bg-ok-soft text-ok border-ok/30',
  warn: 'bg-warn-soft text-warn border-warn/30',
  danger: 'bg-danger-soft text-danger border-danger/30',
};

export function Badge({
  tone = 'neutral',
  children,
  className,
  wrap = false,
}: {
  tone?: BadgeTone;
  children: ReactNode;
  className?: string;
  /** A long badge in a narrow column may take two lines instead of widening it. */
  wrap?: boolean;
}) {
  return (
    <span
      className={cx(
        'inline-flex items-center rounded-full border px-2.5 py-0.5 text-sm font-medium',
        wrap ? 'whitespace-normal' : 'whitespace-nowrap',
        tones[tone],
        className,
      )}
    >
      {children}
    </span>
  );
}
