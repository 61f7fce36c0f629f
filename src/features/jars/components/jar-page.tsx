import { useQuery } from '@tanstack/react-query';
import { lazy, Suspense, useEffect, useState } from 'react';
import { Link } from 'react-router';
import type { Role } from '../../../../shared/enums';
import { jarEventAllowedFrom, jarEventInputTypes, type JarEventInputType } from '../../../../shared/schemas/jar-events';
import type { JarStoryDto } from '../../../../shared/schemas/jar-story';
import { Button, buttonClasses } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { FullPageSpinner } from '../../../components/ui/spinner';
import { paths } from '../../../config/paths';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { cx } from '../../../lib/cx';
import { formatDate } from '../../../lib/format';
import { jarsQueries } from '../api/jars-queries';
import { eventActions } from './jar-event-actions';
import { JarStatusBadge } from './jar-status-badge';
import { JarTimeline } from './jar-timeline';
import { NoSuchJar } from './no-such-jar';

// The form's code stays off the jar page's first load on a weak signal; it is fetched once the page shows.
const loadDialog = () => import('./jar-event-dialog');
const JarEventDialog = lazy(() => loadDialog().then((m) => ({ default: m.JarEventDialog })));

interface Props {
  label: string;
  role: Role;
  canWrite: boolean;
  canFlag: boolean;
}

const reviewers: readonly Role[] = ['supervisor', 'admin'];

function Facts({ story }: { story: JarStoryDto }) {
  const { jar, session, cookRun, prepBatch, ancestry } = story;
  const rows: [string, React.ReactNode][] = [
    ['Grain', `${jar.grain}${prepBatch ? ` · batch ${prepBatch.code}` : ''}`],
    ['Inoculated', `${formatDate(jar.inoculatedAt)}${jar.inoculumMl !== null ? ` · ${jar.inoculumMl} ml` : ''}`],
    [
      'Place',
      jar.room ? `${jar.room} / ${jar.shelf ?? '—'}${jar.shelfPosition ? ` · place ${jar.shelfPosition}` : ''}` : '—',
    ],
    [
      'Session',
      session ? (
        <Link className="text-accent underline" to={paths.session.to(session.id)}>
          {session.code}
        </Link>
      ) : (
        '—'
      ),
    ],
    [
      'Cook run',
      cookRun ? (
        <Link className="text-accent underline" to={paths.cookRun.to(cookRun.id)}>
          {cookRun.code}
        </Link>
      ) : (
        '—'
      ),
    ],
    [
      'Inoculum',
      ancestry.length === 0
        ? '—'
        : ancestry.map((a, i) => (
            <span key={`${a.kind}${a.id}`}>
              {i > 0 && ' ← '}
              {a.kind === 'jar' ? (
                <Link className="text-accent underline" to={paths.jarPage.to(a.label)}>
                  {a.label}
                </Link>
              ) : (
                <Link className="text-accent underline" to={paths.culture.to(a.id)}>
                  {a.code}
                </Link>
              )}
            </span>
          )),
    ],
  ];
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-2">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-muted">{k}</dt>
          <dd className="min-w-0 break-words">{v}</dd>
        </div>
      ))}
    </dl>
  );
}

/** The page a jar's QR code opens: phone first, actions within a thumb's reach. */
export function JarPage({ label, role, canWrite, canFlag }: Props) {
  const story = useQuery(jarsQueries.byLabel(label));
  const shown = story.isSuccess;
  useEffect(() => {
    if (shown && canWrite) void loadDialog();
  }, [shown, canWrite]);
  const [action, setAction] = useState<JarEventInputType | null>(null);
  if (story.isPending) return <FullPageSpinner />;
  if (isApiError(story.error, 404)) return <NoSuchJar label={label} />;
  if (story.error)
    return (
      <Notice tone="danger" title="The jar could not be loaded.">
        {errorMessage(story.error)}
      </Notice>
    );
  const { jar } = story.data;
  const possible = jarEventInputTypes.filter(
    (t) => jarEventAllowedFrom[t].includes(jar.status) && (t !== 'resume' || reviewers.includes(role)),
  );

  return (
    <div className="mx-auto max-w-3xl space-y-6">
      <header className="space-y-2">
        <p className="text-muted">Jar</p>
        <h1 className="font-mono text-4xl font-semibold tracking-tight">{jar.label}</h1>
        <JarStatusBadge status={jar.status} />
      </header>

      {canFlag && jar.status !== 'discarded' && (
        <Link to={paths.flagJar.to(jar.label)} className={buttonClasses('danger', 'w-full min-h-14 text-lg')}>
          Flag contamination
        </Link>
      )}

      {canWrite && possible.length > 0 && (
        <section aria-label="Record on this jar" className="grid grid-cols-2 gap-3 sm:grid-cols-4">
          {possible.map((t) => (
            <Button
              key={t}
              variant={t === 'discarded' ? 'danger' : 'secondary'}
              className={cx('min-h-14 text-lg', t === 'check' && 'col-span-2 sm:col-span-1')}
              onClick={() => setAction(t)}
            >
              {eventActions[t].label}
            </Button>
          ))}
        </section>
      )}

      <Facts story={story.data} />

      <div className="no-print flex flex-wrap gap-3">
        <Link to={paths.lineage.to('jar', jar.id)} className={buttonClasses('secondary')}>
          Where used
        </Link>
        <Link to={paths.jarLabels.to({ ids: String(jar.id) })} className={buttonClasses('secondary')}>
          Print label
        </Link>
      </div>

      <section className="space-y-3">
        <h2 className="text-xl font-semibold">Story</h2>
        <JarTimeline entries={story.data.timeline} />
      </section>

      {action && (
        <Suspense fallback={null}>
          <JarEventDialog jar={jar} type={action} onClose={() => setAction(null)} />
        </Suspense>
      )}
    </div>
  );
}
