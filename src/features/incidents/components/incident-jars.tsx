import { Link } from 'react-router';
import type { IncidentJarDto } from '../../../../shared/schemas/incident-detail';
import { paths } from '../../../config/paths';

const linkClass = 'text-accent underline underline-offset-2 hover:decoration-2';

/** Each jar with where it came from; the codes open the register filtered to that level. */
export function IncidentJars({ jars }: { jars: IncidentJarDto[] }) {
  return (
    <ul className="flex flex-col gap-3">
      {jars.map((jar) => (
        <li key={jar.id} className="rounded-md border border-line p-3 print:break-inside-avoid">
          <p className="flex flex-wrap items-baseline gap-x-3">
            <a href={paths.jarPage.to(jar.label)} className={`${linkClass} text-lg font-semibold`}>
              {jar.label}
            </a>
            <span className="text-muted">
              {jar.grain} · inoculated {jar.inoculatedOn} · now {jar.status}
              {jar.room ? ` · ${jar.room}${jar.shelf ? ` / ${jar.shelf}` : ''}` : ''}
            </span>
          </p>
          <dl className="mt-2 grid grid-cols-1 gap-x-6 gap-y-1 text-sm sm:grid-cols-3">
            <div>
              <dt className="text-muted">Cook run</dt>
              <dd>
                {jar.cookRun ? (
                  <Link className={linkClass} to={paths.incidents.to({ cookRunId: jar.cookRun.id })}>
                    {jar.cookRun.code}
                  </Link>
                ) : (
                  '—'
                )}
              </dd>
            </div>
            <div>
              <dt className="text-muted">Session</dt>
              <dd>
                {jar.session ? (
                  <Link className={linkClass} to={paths.incidents.to({ sessionId: jar.session.id })}>
                    {jar.session.code}
                  </Link>
                ) : (
                  '—'
                )}
                {jar.session?.operatorName ? ` (${jar.session.operatorName})` : ''}
              </dd>
            </div>
            <div>
              <dt className="text-muted">Inoculum</dt>
              <dd>
                {jar.culture ? (
                  <Link className={linkClass} to={paths.incidents.to({ cultureId: jar.culture.id })}>
                    culture {jar.culture.code}
                  </Link>
                ) : jar.ancestry.length ? (
                  <span>
                    {jar.ancestry.map((a, i) => (
                      <span key={`${a.kind}-${a.id}`}>
                        {i > 0 && ' ← '}
                        {a.kind === 'jar' ? (
                          <a className={linkClass} href={paths.jarPage.to(a.code)}>
                            jar {a.code}
                          </a>
                        ) : (
                          <Link className={linkClass} to={paths.incidents.to({ cultureId: a.id })}>
                            culture {a.code}
                          </Link>
                        )}
                      </span>
                    ))}
                  </span>
                ) : (
                  '—'
                )}
              </dd>
            </div>
          </dl>
        </li>
      ))}
    </ul>
  );
}
