import type { FormEvent, ReactNode } from 'react';
import { cx } from '../../lib/cx';
import { Button } from './button';

/** The panel above a register's table; `className` sets its grid columns. */
export function FilterBar({ className, children }: { className: string; children: ReactNode }) {
  return (
    <div className={cx('no-print mb-4 grid gap-4 rounded-lg border border-line bg-surface-raised p-4', className)}>
      {children}
    </div>
  );
}

interface SearchFormProps<K extends string> {
  /** The text boxes the form holds, by name; each is trimmed and an empty one clears its filter. */
  names: readonly K[];
  values: Partial<Record<K, string | number | undefined>>;
  onSearch: (patch: Record<K, string | undefined>) => void;
  className?: string;
  /** Shows the button's word on phones too. */
  wordOnPhones?: boolean;
  children: ReactNode;
}

export function SearchForm<K extends string>(props: SearchFormProps<K>) {
  const { names, values, onSearch, className, wordOnPhones, children } = props;
  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    const text = (key: K) => {
      const value = data.get(key);
      return typeof value === 'string' && value.trim() ? value.trim() : undefined;
    };
    onSearch(Object.fromEntries(names.map((name) => [name, text(name)])) as Record<K, string | undefined>);
  };
  return (
    // Keyed on the URL values so "Clear filters" and back/forward refill the boxes.
    <form
      role="search"
      onSubmit={submit}
      className={className ?? 'flex items-end gap-2'}
      key={names.map((name) => values[name] ?? '').join('|')}
    >
      {children}
      <Button type="submit" variant="secondary" icon="search">
        {wordOnPhones ? 'Search' : <span className="sr-only sm:not-sr-only">Search</span>}
      </Button>
    </form>
  );
}

export function ClearFilters({
  shown,
  onClear,
  className,
}: {
  shown: boolean;
  onClear: () => void;
  className?: string;
}) {
  if (!shown) return null;
  return (
    <div className={className}>
      <Button variant="ghost" onClick={onClear}>
        Clear filters
      </Button>
    </div>
  );
}
