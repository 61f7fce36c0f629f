import { cx } from '../../../lib/cx';

interface ChoiceTilesProps<V extends string> {
  legend: string;
  name: string;
  options: readonly { value: V; label: string }[];
  value: V | undefined;
  onChange: (value: V | undefined) => void;
  /** Tapping the chosen tile again clears it (for optional signs). */
  clearable?: boolean;
  size?: 'large' | 'chip';
  columns?: string;
  error?: string;
}

/** Radio buttons drawn as big tap targets, for one-handed use on the shelf. */
export function ChoiceTiles<V extends string>({
  legend,
  name,
  options,
  value,
  onChange,
  clearable,
  size = 'large',
  columns,
  error,
}: ChoiceTilesProps<V>) {
  return (
    <fieldset className="flex flex-col gap-2" aria-invalid={error ? true : undefined}>
      <legend className="mb-2 font-medium">{legend}</legend>
      <div
        className={cx(
          'gap-2',
          size === 'large' ? cx('grid', columns ?? 'grid-cols-2 sm:grid-cols-3') : 'flex flex-wrap',
        )}
      >
        {options.map((o) => {
          const checked = value === o.value;
          return (
            <label
              key={o.value}
              className={cx(
                'flex cursor-pointer items-center justify-center rounded-md border-2 text-center font-semibold has-focus-visible:outline-3 has-focus-visible:outline-accent',
                size === 'large' ? 'min-h-14 px-3 py-3' : 'min-h-touch px-3 py-1.5 text-sm',
                checked ? 'border-accent bg-accent text-accent-fg' : 'border-line-strong bg-surface-raised text-ink',
              )}
            >
              <input
                type="radio"
                name={name}
                value={o.value}
                checked={checked}
                className="sr-only"
                onChange={() => onChange(o.value)}
                onClick={() => clearable && checked && onChange(undefined)}
              />
              {o.label}
            </label>
          );
        })}
      </div>
      {error && <p className="text-sm font-medium text-danger">{error}</p>}
    </fieldset>
  );
}
