import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { CultureState } from '../../../../shared/enums';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Fact, Facts } from '../../../components/ui/facts';
import { LoadFailed } from '../../../components/ui/load-failed';
import { BackLink, TextLink } from '../../../components/ui/text-link';
import { PageHeader } from '../../../components/ui/page-header';
import { FullPageSpinner } from '../../../components/ui/spinner';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import { culturesQueries } from '../api/cultures-queries';
import { AgarTestDialog } from './agar-test-dialog';
import { ChangeStateDialog } from './change-state-dialog';
import { CreateCultureDialog } from './create-culture-dialog';
import { CultureStateBadge } from './culture-state-badge';

const resultTone = { clean: 'ok', contaminated: 'danger', inconclusive: 'warn' } as const;
const stateButtons: Record<CultureState, string> = {
  quarantined: 'Quarantine',
  released: 'Release',
  retired: 'Retire',
};

interface Props {
  id: number;
  canWrite: boolean;
  canChangeState: boolean;
}

export function CultureDetail({ id, canWrite, canChangeState }: Props) {
  const detail = useQuery(culturesQueries.detail(id));
  const [target, setTarget] = useState<CultureState | null>(null);
  const [testing, setTesting] = useState(false);
  const [makingChild, setMakingChild] = useState(false);

  if (detail.isPending) return <FullPageSpinner label="Loading culture" />;
  if (detail.error) {
    return (
      <LoadFailed title="The culture could not be loaded." error={detail.error} onRetry={() => void detail.refetch()} />
    );
  }
  const c = detail.data;
  const lastAgarResult = c.agarTests[0]?.result ?? null;

  return (
    <>
      <BackLink to={paths.cultures.to()}>Cultures</BackLink>
      <PageHeader
        title={`Culture ${c.code}`}
        description={<span className="italic">{[c.species, c.strain].filter(Boolean).join(' · ') || undefined}</span>}
        actions={
          canWrite && (
            <Button variant="secondary" icon="plus" onClick={() => setMakingChild(true)}>
              New culture from this one
            </Button>
          )
        }
      />
      <div className="flex flex-col gap-6">
        <section aria-label="State" className="flex flex-col gap-3 rounded-lg border border-line bg-surface-raised p-4">
          <div className="flex flex-wrap items-center gap-3">
            <CultureStateBadge state={c.state} />
            {c.state !== 'released' && (
              <span className="text-muted">Jars made from it are flagged: it is {c.state}, not released.</span>
            )}
          </div>
          {canChangeState && c.allowedStates.length > 0 && (
            <div className="no-print flex flex-wrap gap-3">
              {c.allowedStates.map((s) => (
                <Button key={s} variant={s === 'retired' ? 'secondary' : 'primary'} onClick={() => setTarget(s)}>
                  {stateButtons[s]}
                </Button>
              ))}
            </div>
          )}
        </section>

        <section aria-label="Details" className="rounded-lg border border-line bg-surface-raised p-4">
          <Facts>
            <Fact term="Prepared on">{c.preparedOn ? formatDate(c.preparedOn) : '—'}</Fact>
            <Fact term="Generation">{c.generation ?? '—'}</Fact>
            <Fact term="Volume">{c.volumeMl === null ? '—' : `${c.volumeMl} ml`}</Fact>
            <Fact term="Parent">
              {c.parent ? <TextLink to={paths.culture.to(c.parent.id)}>{c.parent.code}</TextLink> : '—'}
            </Fact>
            <Fact term="Made from it">
              {c.children.length === 0
                ? 'No cultures yet'
                : c.children.map((child, i) => (
                    <span key={child.id}>
                      {i > 0 && ', '}
                      <TextLink to={paths.culture.to(child.id)}>{child.code}</TextLink>
                    </span>
                  ))}
            </Fact>
          </Facts>
          {c.notes && <p className="mt-4 whitespace-pre-line">{c.notes}</p>}
        </section>

        <section aria-labelledby="agar-title" className="rounded-lg border border-line bg-surface-raised p-4">
          <div className="flex flex-wrap items-center justify-between gap-3">
            <h2 id="agar-title" className="text-lg font-semibold">
              Agar tests
            </h2>
            {canWrite && (
              <Button variant="secondary" icon="plus" onClick={() => setTesting(true)} className="no-print">
                Record a test
              </Button>
            )}
          </div>
          {c.agarTests.length === 0 ? (
            <p className="mt-2 text-muted">No agar tests recorded.</p>
          ) : (
            <ul className="mt-3 divide-y divide-line">
              {c.agarTests.map((t) => (
                <li key={t.id} className="flex flex-wrap items-center gap-3 py-2">
                  <span className="whitespace-nowrap">{formatDate(t.testedOn)}</span>
                  <Badge tone={resultTone[t.result]}>{t.result}</Badge>
                  {t.photoId !== null && <span className="text-sm text-muted">photo {t.photoId}</span>}
                  {t.notes && <span className="text-muted">{t.notes}</span>}
                </li>
              ))}
            </ul>
          )}
        </section>
      </div>
      <ChangeStateDialog culture={{ ...c, lastAgarResult }} target={target} onClose={() => setTarget(null)} />
      {canWrite && <AgarTestDialog cultureId={c.id} open={testing} onClose={() => setTesting(false)} />}
      {canWrite && <CreateCultureDialog open={makingChild} onClose={() => setMakingChild(false)} parent={c} />}
    </>
  );
}
