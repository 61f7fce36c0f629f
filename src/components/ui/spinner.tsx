import { cx } from '../../lib/cx';

interface SpinnerProps {
  /** Read out by screen readers; omit when a surrounding label already says it. */
  label?: string;
  size?: number;
  className?: string;
}

export function Spinner({ label, size = 20, className }: SpinnerProps) {
  return (
    <span role={label ? 'status' : undefined} className={cx('inline-flex items-center gap-2', className)}>
      <svg width={size} height={size} viewBox="0 0 24 24" aria-hidden="true" className="animate-spin">
        <circle cx="12" cy="12" r="9" fill="none" stroke="currentColor" strokeOpacity="0.25" strokeWidth="3" />
        <path d="M21 12a9 9 0 0 0-9-9" fill="none" stroke="currentColor" strokeWidth="3" strokeLinecap="round" />
      </svg>
      {label && <span className="sr-only">{label}</span>}
    </span>
  );
}

export function FullPageSpinner({ label = 'Loading' }: { label?: string }) {
  return (
    <div className="flex min-h-[60vh] items-center justify-center text-accent">
      <Spinner label={label} size={32} />
    </div>
  );
}
