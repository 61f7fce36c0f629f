import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router';
import type { ShelfMark } from '../../../../shared/schemas/jar-shelf';
import { Button, buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { useOutbox } from '../../../lib/outbox/use-outbox';
import { jarsQueries } from '../api/jars-queries';
import { queueMark, undoMark } from '../walk-outbox';
import { useWalk, type Walk } from '../walk-state';
import { ShelfChooser } from './shelf-chooser';

const markLabels: Record<ShelfMark, string> = { clean: 'Clean', colonised: 'Colonised', shaken: 'Shaken' };

/** One jar at a time, one tap each; every mark is saved as it is made, and the walk survives leaving it. */
export function ShelfWalkScreen({ canFlag }: { canFlag: boolean }) {
  const [walk, setWalk] = useWalk();
  const [params, setParams] = useSearchParams();
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const { items: queue } = useOutbox();
  const [starting, setStarting] = useState(false);
  const [error, setError] = useState<string>();
  const [busy, setBusy] = useState(false);

  const start = async (room: string, shelf: string) => {
    setStarting(true);
    setError(undefined);
    try {
      const { items } = await queryClient.fetchQuery({ ...jarsQueries.shelf(room, shelf), staleTime: 0 });
      setWalk({ room, shelf, jars: items, index: 0, marks: [] });
      setParams({ room, shelf }, { replace: true });
    } catch (e) {
      setError(errorMessage(e));
    } finally {
      setStarting(false);
    }
  };

  // A link to a shelf (from the jars list) preselects it; a walk in progress always resumes first.
  const wanted = { room: params.get('room')?.trim() ?? '', shelf: params.get('shelf')?.trim() ?? '' };

  const update = (patch: Partial<Walk>) => walk && setWalk({ ...walk, ...patch });
  const jar = walk?.jars[walk.index];
  const waiting = new Set(queue?.filter((i) => i.kind === 'mark').map((i) => i.id));
  const unsent = walk?.marks.filter((m) => waiting.has(m.key)).length ?? 0;
  const last = walk?.marks.at(-1);

  const mark = async (m: ShelfMark) => {
    if (!walk || !jar || busy) return;
    setBusy(true);
    try {
      const made = await queueMark(jar, m);
      update({ marks: [...walk.marks, made], index: walk.index + 1 });
    } finally {
      setBusy(false);
    }
  };
  const undo = async () => {
    if (!walk || !last || busy) return;
    setBusy(true);
    try {
      await undoMark(last);
      const at = walk.jars.findIndex((j) => j.id === last.jarId);
      update({ marks: walk.marks.slice(0, -1), index: at >= 0 ? at : walk.index });
    } finally {
      setBusy(false);
    }
  };
  const end = () => {
    setWalk(null);
    setParams({}, { replace: true });
  };

  return (
    <div className="mx-auto max-w-xl space-y-5">
      <PageHeader
        title="Shelf walk"
        description={
          walk ? `${walk.room} / ${walk.shelf}` : 'Go along a shelf and mark each incubating jar with one tap.'
        }
        actions={
          walk && (
            <Button variant="ghost" onClick={end}>
              Change shelf
            </Button>
          )
        }
      />
      {error && (
        <Notice tone="danger" title="The shelf could not be loaded.">
          {error}
        </Notice>
      )}
      {!walk && <ShelfChooser initial={wanted} onChoose={(r, s) => void start(r, s)} busy={starting} />}
      {walk && walk.jars.length === 0 && <EmptyState title="No jars are incubating on this shelf." />}

      {walk && jar && (
        <section
          aria-label={`Jar ${walk.index + 1} of ${walk.jars.length}`}
          className="space-y-4 rounded-xl border border-line bg-surface-raised p-4"
        >
          <p className="text-lg font-medium text-muted" aria-live="polite">
            {walk.index + 1} of {walk.jars.length}
          </p>
          <div className="space-y-1">
            <Link to={paths.jarPage.to(jar.label)} className="font-mono text-4xl font-semibold text-accent">
              {jar.label}
            </Link>
            <p className="text-muted">
              {jar.grain} · {jar.cultureCode ?? (jar.parentJarLabel ? `from ${jar.parentJarLabel}` : '—')}
              {jar.shelfPosition ? ` · place ${jar.shelfPosition}` : ''}
            </p>
          </div>
          <div className="grid grid-cols-3 gap-3">
            {(['clean', 'colonised', 'shaken'] as const).map((m) => (
              <Button
                key={m}
                className="min-h-16 text-lg"
                variant={m === 'clean' ? 'primary' : 'secondary'}
                disabled={busy}
                onClick={() => void mark(m)}
              >
                {markLabels[m]}
              </Button>
            ))}
          </div>
          <div className="grid grid-cols-2 gap-3">
            {canFlag && (
              <Button
                variant="danger"
                className="min-h-14 text-lg"
                onClick={() => {
                  update({ index: walk.index + 1 });
                  void navigate(paths.flagJar.to(jar.label), { state: { back: paths.shelfWalk.to() } });
                }}
              >
                Flag
              </Button>
            )}
            <Button variant="ghost" className="min-h-14 text-lg" onClick={() => update({ index: walk.index + 1 })}>
              Skip
            </Button>
          </div>
        </section>
      )}

      {walk && walk.jars.length > 0 && !jar && (
        <section className="space-y-3">
          <p className="text-lg font-medium">
            End of the shelf: {walk.marks.length} of {walk.jars.length} marked.
          </p>
          <Link
            to={paths.jars.to({ room: walk.room, shelf: walk.shelf })}
            className={buttonClasses('secondary', 'w-full')}
          >
            See this shelf’s jars
          </Link>
          <Button variant="ghost" className="w-full" onClick={end}>
            Walk another shelf
          </Button>
        </section>
      )}

      {walk && (
        <div className="flex items-center justify-between gap-3">
          <p className="text-sm text-muted" data-testid="walk-saved">
            {walk.marks.length} marked
            {unsent ? ` · ${unsent} waiting to send` : walk.marks.length ? ' · all saved' : ''}
          </p>
          {last && (
            <Button variant="secondary" disabled={busy} onClick={() => void undo()}>
              Undo {last.label} ({markLabels[last.mark].toLowerCase()})
            </Button>
          )}
        </div>
      )}
    </div>
  );
}
