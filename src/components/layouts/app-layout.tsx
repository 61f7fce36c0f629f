import { useEffect, useRef, useState, type ReactNode } from 'react';
import { Link, NavLink, useLocation, useNavigation } from 'react-router';
import type { Role } from '../../../shared/enums';
import { navigationFor, prioritisedFor } from '../../config/navigation';
import { paths } from '../../config/paths';
import { roleLabels } from '../../config/roles';
import { Badge } from '../ui/badge';
import { Button, buttonClasses } from '../ui/button';
import { Dialog } from '../ui/dialog';
import { Icon } from '../ui/icon';
import { BottomBar, SideNav } from './nav-links';
import { OutboxBar } from './outbox-bar';

interface AppLayoutProps {
  user: { displayName: string; role: Role };
  onSignOut: () => void;
  signingOut: boolean;
  children: ReactNode;
}

const barSlots = 4;

export function AppLayout({ user, onSignOut, signingOut, children }: AppLayoutProps) {
  const items = navigationFor(user.role);
  const crowded = items.length > barSlots;
  const barItems = prioritisedFor(user.role).slice(0, barSlots - 1);
  const [moreOpen, setMoreOpen] = useState(false);
  const mainRef = useRef<HTMLElement>(null);
  const { pathname } = useLocation();
  const loading = useNavigation().state === 'loading';
  const firstRender = useRef(true);

  // Move focus to the new screen so keyboard and screen-reader users start at its top, not in the nav.
  useEffect(() => {
    if (firstRender.current) {
      firstRender.current = false;
      return;
    }
    mainRef.current?.focus({ preventScroll: true });
    setMoreOpen(false);
  }, [pathname]);

  return (
    <div className="min-h-dvh">
      <a
        href="#main"
        className="sr-only z-50 rounded-md bg-accent px-4 py-3 font-semibold text-accent-fg focus:not-sr-only focus:fixed focus:top-2 focus:left-2"
      >
        Skip to content
      </a>
      <header data-chrome className="no-print sticky top-0 z-30 border-b border-line bg-surface-raised">
        {loading && <div className="absolute inset-x-0 top-0 h-1 animate-pulse bg-accent" aria-hidden="true" />}
        <div className="flex min-h-16 items-center gap-3 px-4">
          <Link
            to={paths.home.to()}
            className="flex min-h-touch items-center gap-2 rounded-md text-xl font-bold text-accent-strong"
          >
            <svg viewBox="0 0 32 32" width="28" height="28" aria-hidden="true">
              <circle cx="16" cy="16" r="12" fill="none" stroke="currentColor" strokeWidth="4" />
              <circle cx="16" cy="16" r="4" fill="currentColor" />
            </svg>
            Asepta
          </Link>
          <div className="ml-auto flex items-center gap-3">
            <p className="hidden text-right leading-tight md:block">
              <span className="block font-semibold">{user.displayName}</span>
              <span className="text-sm text-muted">{roleLabels[user.role]}</span>
            </p>
            <Link to={paths.scan.to()} className={buttonClasses('secondary')} aria-label="Scan a QR code">
              <Icon name="scan" size={22} />
              <span className="sr-only sm:not-sr-only">Scan</span>
            </Link>
            <Badge tone="accent" className="md:hidden">
              {roleLabels[user.role]}
            </Badge>
            <Button variant="secondary" icon="sign-out" onClick={onSignOut} pending={signingOut}>
              <span className="sr-only sm:not-sr-only">Sign out</span>
            </Button>
          </div>
        </div>
      </header>
      <OutboxBar />
      <div className="flex">
        <SideNav items={items} />
        <main
          id="main"
          ref={mainRef}
          tabIndex={-1}
          className="min-w-0 flex-1 px-4 pt-6 pb-28 outline-none sm:px-6 sm:pb-10 lg:px-10"
        >
          <div className="mx-auto max-w-6xl">{children}</div>
        </main>
      </div>
      <BottomBar items={crowded ? barItems : items} onMore={crowded ? () => setMoreOpen(true) : undefined} />
      <Dialog open={moreOpen} onClose={() => setMoreOpen(false)} title="All screens" size="sm">
        <ul className="flex flex-col gap-1">
          {items.map((item) => (
            <li key={item.id}>
              <NavLink
                to={item.to}
                end={item.end}
                onClick={() => setMoreOpen(false)}
                className="flex min-h-12 items-center gap-3 rounded-md px-3 font-medium hover:bg-surface-sunken aria-[current=page]:bg-accent-soft aria-[current=page]:text-accent-strong"
              >
                {item.icon && <Icon name={item.icon} />}
                {item.label}
              </NavLink>
            </li>
          ))}
        </ul>
      </Dialog>
    </div>
  );
}
