import type { TimelineEntryDto } from '../../../../shared/schemas/jar-story';
import { Link } from 'react-router';
import { paths } from '../../../config/paths';
import { cx } from '../../../lib/cx';
import { formatDate, formatDateTime } from '../../../lib/format';

// On the lab's clock, like every other time on screen.
const when = (at: string) => (at.length === 10 ? formatDate(at) : formatDateTime(at));

const dots: Record<TimelineEntryDto['kind'], string> = {
  'grain-prep': 'bg-warn',
  'cook-run': 'bg-danger',
  culture: 'bg-accent',
  session: 'bg-accent',
  inoculated: 'bg-ok',
  event: 'bg-line-strong',
  incident: 'bg-danger',
  photo: 'bg-line-strong',
};

/** The jar's story, oldest first, as the server ordered it. */
export function JarTimeline({ entries }: { entries: TimelineEntryDto[] }) {
  return (
    <ol aria-label="The jar’s story" className="relative space-y-4 border-l-2 border-line pl-5">
      {entries.map((e, i) => (
        <li key={`${e.kind}-${e.ref ?? i}-${i}`} className="relative">
          <span
            aria-hidden
            className={cx('absolute top-1.5 -left-[1.72rem] h-3 w-3 rounded-full ring-4 ring-surface', dots[e.kind])}
          />
          <p className="text-sm text-muted">
            <time dateTime={e.at}>{when(e.at)}</time>
          </p>
          <p className={cx('font-medium', e.kind === 'incident' && 'text-danger')}>
            {e.kind === 'incident' && e.ref !== null ? (
              <Link to={paths.incident.to(e.ref)} className="underline">
                {e.title} (#{e.ref})
              </Link>
            ) : (
              e.title
            )}
          </p>
          {e.detail && <p className="text-muted">{e.detail}</p>}
        </li>
      ))}
    </ol>
  );
}
