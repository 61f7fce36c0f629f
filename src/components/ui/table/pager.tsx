import { useId } from 'react';
import { countText } from '../../../lib/count-text';
import { pageSizes, type TableState } from '../../../lib/list-params';
import { Button } from '../button';
import { controlClasses } from '../field';

interface PagerProps extends Omit<TableState, 'sort'> {
  total: number;
  /** The server stopped counting at `total`: more rows follow, how many is not known. */
  totalCapped?: boolean;
  onChange: (patch: Partial<TableState>) => void;
  /** What the pages hold, where a screen pages more than one thing (a grid's rows and its columns). */
  noun?: string;
  /** The page sizes offered; the registers' sizes unless a screen needs others. */
  sizes?: readonly number[];
}

export function Pager({ page, pageSize, total, totalCapped = false, noun, onChange, sizes = pageSizes }: PagerProps) {
  const sizeId = useId();
  const pageCount = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(page * pageSize, total);

  return (
    <div className="no-print flex flex-col gap-3 border-t border-line px-4 py-3 sm:flex-row sm:items-center sm:justify-between">
      <p aria-live="polite" className="text-muted">
        {total === 0
          ? 'No rows'
          : `${noun ? `${noun}: s` : 'S'}howing ${first}–${last} of ${countText(total, totalCapped)}`}
      </p>
      <div className="flex flex-wrap items-center gap-3">
        <div className="flex items-center gap-2">
          <label htmlFor={sizeId} className="whitespace-nowrap text-muted">
            {noun ? `${noun}, per page` : 'Rows per page'}
          </label>
          <select
            id={sizeId}
            value={pageSize}
            onChange={(event) => onChange({ pageSize: Number(event.target.value), page: 1 })}
            className={`${controlClasses} w-auto cursor-pointer`}
          >
            {sizes.map((size) => (
              <option key={size} value={size}>
                {size}
              </option>
            ))}
          </select>
        </div>
        <div className="flex items-center gap-2">
          <Button
            variant="secondary"
            icon="chevron-left"
            disabled={page <= 1}
            onClick={() => onChange({ page: page - 1 })}
          >
            <span className="sr-only">Previous page{noun && ` of ${noun}`}</span>
          </Button>
          <span className="min-w-20 text-center tabular-nums">
            {totalCapped
              ? `Page ${page} of ${countText(pageCount, true)}`
              : `Page ${Math.min(page, pageCount)} of ${pageCount}`}
          </span>
          <Button
            variant="secondary"
            icon="chevron-right"
            disabled={page >= pageCount && !totalCapped}
            onClick={() => onChange({ page: page + 1 })}
          >
            <span className="sr-only">Next page{noun && ` of ${noun}`}</span>
          </Button>
        </div>
      </div>
    </div>
  );
}
