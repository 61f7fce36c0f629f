import { Link } from 'react-router';
import { Badge } from '../../components/ui/badge';
import { Icon } from '../../components/ui/icon';
import { cautionFootnote, cautions } from '../../config/cautions';
import { prioritisedFor } from '../../config/navigation';
import { roleLabels, roleSummaries } from '../../config/roles';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { WeeklyScreen } from '../../features/analysis/components/weekly-screen';
import { SupervisorQueue } from '../../features/queue/components/supervisor-queue';
import { formatLongDate, greeting, isoWeek } from '../../lib/format';

export function HomeRoute() {
  const me = useCurrentUser();
  const now = new Date();
  const tiles = prioritisedFor(me.role).filter((item) => item.id !== 'home');

  return (
    <>
      <title>Home · Asepta</title>
      <section aria-labelledby="greeting" className="mb-8">
        <p className="text-muted">
          {formatLongDate(now)} · week {isoWeek(now)}
        </p>
        <h1 id="greeting" className="mt-1 text-2xl font-semibold tracking-tight sm:text-3xl">
          {greeting(now)}, {me.displayName}
        </h1>
        <div className="mt-3 flex max-w-prose flex-wrap items-center gap-x-3 gap-y-2">
          <Badge tone="accent">{roleLabels[me.role]}</Badge>
          <p className="text-muted">{roleSummaries[me.role]}</p>
        </div>
      </section>

      {me.role === 'supervisor' && <SupervisorQueue />}

      {me.role === 'supervisor' && (
        <div className="mb-10">
          <WeeklyScreen compact />
        </div>
      )}

      <section aria-labelledby="screens" className="mb-10">
        <h2 id="screens" className="mb-3 text-lg font-semibold">
          Your screens
        </h2>
        <ul className="grid gap-4 sm:grid-cols-2 xl:grid-cols-3">
          {tiles.map((item) => (
            <li key={item.id}>
              <Link
                to={item.to}
                className="group flex h-full min-h-28 items-start gap-4 rounded-xl border-2 border-line bg-surface-raised p-5 shadow-raised hover:border-accent"
              >
                {item.icon && (
                  <span className="rounded-lg bg-accent-soft p-3 text-accent">
                    <Icon name={item.icon} size={28} />
                  </span>
                )}
                <span className="min-w-0">
                  <span className="flex items-center gap-1 text-lg font-semibold group-hover:text-accent-strong">
                    {item.label}
                    <Icon name="chevron-right" size={18} />
                  </span>
                  {item.description && <span className="mt-1 block text-muted">{item.description}</span>}
                </span>
              </Link>
            </li>
          ))}
        </ul>
      </section>

      <section aria-labelledby="safety" className="rounded-xl border-2 border-warn/40 bg-warn-soft p-5">
        <h2 id="safety" className="flex items-center gap-2 text-lg font-semibold">
          <span className="text-warn">
            <Icon name="alert" />
          </span>
          Safety at the bench
        </h2>
        <dl className="mt-3 grid gap-x-8 gap-y-3 md:grid-cols-2">
          {cautions.map((caution) => (
            <div key={caution.id}>
              <dt className="font-semibold">{caution.title}</dt>
              <dd>{caution.text}</dd>
            </div>
          ))}
        </dl>
        <p className="mt-4 text-sm text-muted">{cautionFootnote}</p>
      </section>
    </>
  );
}
