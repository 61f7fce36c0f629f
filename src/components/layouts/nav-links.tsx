import { NavLink } from 'react-router';
import type { NavItem } from '../../config/navigation';
import { cx } from '../../lib/cx';
import { Icon } from '../ui/icon';

export function SideNav({ items }: { items: NavItem[] }) {
  return (
    <nav aria-label="Main" className="no-print hidden w-60 shrink-0 sm:block">
      <ul className="sticky top-20 flex flex-col gap-1 p-3">
        {items.map((item) => (
          <li key={item.id}>
            <NavLink
              to={item.to}
              end={item.end}
              className={({ isActive }) =>
                cx(
                  'flex min-h-12 items-center gap-3 rounded-md border-l-4 px-3 font-medium',
                  isActive
                    ? 'border-accent bg-accent-soft font-semibold text-accent-strong'
                    : 'border-transparent text-ink hover:bg-surface-sunken',
                )
              }
            >
              {item.icon && <Icon name={item.icon} />}
              {item.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}

interface BottomBarProps {
  items: NavItem[];
  /** Shown when the role has more screens than fit along the bottom. */
  onMore?: () => void;
}

const barItem = 'relative flex min-h-16 flex-1 flex-col items-center justify-center gap-0.5 px-1 text-sm font-medium';

export function BottomBar({ items, onMore }: BottomBarProps) {
  return (
    <nav
      aria-label="Main"
      className="no-print fixed inset-x-0 bottom-0 z-40 border-t border-line bg-surface-raised pb-[env(safe-area-inset-bottom)] sm:hidden"
    >
      <ul className="flex">
        {items.map((item) => (
          <li key={item.id} className="flex flex-1">
            <NavLink
              to={item.to}
              end={item.end}
              className={({ isActive }) =>
                cx(
                  barItem,
                  isActive
                    ? 'font-semibold text-accent before:absolute before:inset-x-3 before:top-0 before:h-1 before:rounded-b before:bg-accent'
                    : 'text-muted',
                )
              }
            >
              {item.icon && <Icon name={item.icon} />}
              <span className="max-w-full truncate">{item.label}</span>
            </NavLink>
          </li>
        ))}
        {onMore && (
          <li className="flex flex-1">
            <button type="button" onClick={onMore} className={cx(barItem, 'text-muted')}>
              <Icon name="more" />
              More
            </button>
          </li>
        )}
      </ul>
    </nav>
  );
}
