import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router';
import { jarEventAllowedFrom, type JarRowDto, type ShelfMark } from '../../../../shared/schemas/jars';
import { Button, buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { Spinner } from '../../../components/ui/spinner';
import { TextInput } from '../../../components/ui/text-input';
import { useToast } from '../../../components/ui/toast';
import { paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { jarsQueries } from '../api/jars-queries';
import { useRecordShelfWalk } from '../api/use-record-shelf-walk';
import { JarStatusBadge } from './jar-status-badge';

const markEvent: Record<ShelfMark, 'check' | 'colonised' | 'shaken'> = {
  clean: 'check',
  colonised: 'colonised',
  shaken: 'shaken',
};
const markLabels: Record<ShelfMark, string> = { clean: 'Clean', colonised: 'Colonised', shaken: 'Shaken' };
const canMark = (jar: JarRowDto, mark: ShelfMark) => jarEventAllowedFrom[markEvent[mark]].includes(jar.status);

function ChooseShelf({ onChoose }: { onChoose: (room: string, shelf: string) => void }) {
  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    const text = (key: string) => {
      const value = data.get(key);
      return typeof value === 'string' ? value.trim() : '';
    };
    const room = text('room');
    const shelf = text('shelf');
    if (room && shelf) onChoose(room, shelf);
  };
  return (
    <form onSubmit={submit} className="grid gap-4 sm:grid-cols-[1fr_1fr_auto] sm:items-end">
      <TextInput label="Room" name="room" required autoComplete="off" />
      <TextInput label="Shelf" name="shelf" required autoComplete="off" />
      <Button type="submit" className="min-h-14 text-lg">
        Start the walk
      </Button>
    </form>
  );
}

/** One jar at a time, one tap each; the marks are saved together in one go. */
export function ShelfWalkScreen({ canFlag }: { canFlag: boolean }) {
  const [params, setParams] = useSearchParams();
  const room = params.get('room')?.trim() ?? '';
  const shelf = params.get('shelf')?.trim() ?? '';
  const chosen = Boolean(room && shelf);
  const jars = useQuery({ ...jarsQueries.shelf(room, shelf), enabled: chosen, staleTime: Infinity });
  const [index, setIndex] = useState(0);
  const [marks, setMarks] = useState<Map<number, ShelfMark>>(new Map());
  const save = useRecordShelfWalk();
  const toast = useToast();
  const navigate = useNavigate();

  const restart = (nextRoom?: string, nextShelf?: string) => {
    setIndex(0);
    setMarks(new Map());
    save.reset();
    setParams(nextRoom && nextShelf ? { room: nextRoom, shelf: nextShelf } : {});
  };
  const submit = async () => {
    const body = { marks: [...marks].map(([jarId, mark]) => ({ jarId, mark })) };
    if (body.marks.length === 0) return true;
    try {
      const res = await save.mutateAsync(body);
      toast.success(`${res.marked} ${res.marked === 1 ? 'jar' : 'jars'} marked on ${room} / ${shelf}.`);
      return true;
    } catch {
      return false;
    }
  };

  const list = jars.data?.items ?? [];
  const jar = list[index];
  const done = chosen && jars.data && index >= list.length;
  const mark = (m: ShelfMark) => {
    if (!jar) return;
    setMarks(new Map(marks).set(jar.id, m));
    setIndex(index + 1);
  };

  return (
    <div className="mx-auto max-w-xl space-y-6">
      <PageHeader
        title="Shelf walk"
        description={chosen ? `${room} / ${shelf}` : 'Go along a shelf and mark each jar with one tap.'}
        actions={
          chosen && (
            <Button variant="ghost" onClick={() => restart()}>
              Change shelf
            </Button>
          )
        }
      />
      {!chosen && <ChooseShelf onChoose={(r, s) => restart(r, s)} />}
      {chosen && jars.isPending && <Spinner label="Loading the shelf" />}
      {jars.error && (
        <Notice tone="danger" title="The shelf could not be loaded.">
          {errorMessage(jars.error)}
        </Notice>
      )}
      {chosen && jars.data && list.length === 0 && <EmptyState title="No jars on this shelf." />}

      {jar && (
        <section
          aria-label={`Jar ${index + 1} of ${list.length}`}
          className="space-y-5 rounded-xl border border-line bg-surface-raised p-5"
        >
          <p className="text-lg font-medium text-muted" aria-live="polite">
            {index + 1} of {list.length}
          </p>
          <div className="space-y-1">
            <Link
              to={paths.jarPage.to(jar.label)}
              className="font-mono text-4xl font-semibold text-accent underline-offset-4 hover:underline"
            >
              {jar.label}
            </Link>
            <p className="text-muted">
              {jar.grain} · {jar.cultureCode ?? (jar.parentJarLabel ? `from ${jar.parentJarLabel}` : '—')}
              {jar.shelfPosition ? ` · place ${jar.shelfPosition}` : ''}
            </p>
            <JarStatusBadge status={jar.status} />
          </div>
          <div className="grid grid-cols-3 gap-3">
            {(['clean', 'colonised', 'shaken'] as const).map((m) => (
              <Button
                key={m}
                className="min-h-16 text-lg"
                variant={m === 'clean' ? 'primary' : 'secondary'}
                disabled={!canMark(jar, m)}
                onClick={() => mark(m)}
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
                pending={save.isPending}
                onClick={async () => {
                  if (await submit()) void navigate(paths.flagJar.to(jar.label));
                }}
              >
                Flag
              </Button>
            )}
            <Button variant="ghost" className="min-h-14 text-lg" onClick={() => setIndex(index + 1)}>
              Next
            </Button>
          </div>
          {marks.size > 0 && (
            <p className="text-muted">{marks.size} marked so far; they are saved at the end of the shelf.</p>
          )}
        </section>
      )}

      {done && list.length > 0 && (
        <section className="space-y-4">
          <p className="text-lg font-medium">
            End of the shelf: {marks.size} of {list.length} marked.
          </p>
          {save.error && (
            <Notice tone="danger" title="The walk was not saved; nothing was written.">
              {errorMessage(save.error)}
            </Notice>
          )}
          {save.isSuccess ? (
            <Link to={paths.jars.to({ room, shelf })} className={buttonClasses('secondary', 'w-full')}>
              See this shelf’s jars
            </Link>
          ) : (
            <Button
              className="min-h-14 w-full text-lg"
              pending={save.isPending}
              disabled={marks.size === 0}
              onClick={() => void submit()}
            >
              Save {marks.size} {marks.size === 1 ? 'mark' : 'marks'}
            </Button>
          )}
          <Button variant="ghost" className="w-full" onClick={() => restart(room, shelf)}>
            Walk the shelf again from the start
          </Button>
        </section>
      )}
    </div>
  );
}
