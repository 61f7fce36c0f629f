import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router';
import { NotFound } from '../../components/errors/not-found';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { ActionVerdict } from '../../features/analysis/components/action-verdict';
import { IncidentDetail } from '../../features/incidents/components/incident-detail';
import { peopleQuery } from '../../features/users/api/people-query';

export function IncidentRoute() {
  const me = useCurrentUser();
  const id = Number(useParams().id);
  const people = useQuery({ ...peopleQuery(), enabled: me.role === 'supervisor' });
  if (!Number.isInteger(id) || id < 1) return <NotFound />;
  return (
    <>
      <title>{`Incident ${id} · Asepta`}</title>
      <IncidentDetail
        id={id}
        me={me}
        people={people.data}
        actionExtra={(a) => a.factor && <ActionVerdict actionId={a.id} />}
        actionClosing={(a, doneOn) =>
          a.factor ? (
            <ActionVerdict actionId={a.id} doneOn={doneOn} />
          ) : (
            <p className="text-sm text-muted">This action names no factor level, so there is no before and after.</p>
          )
        }
      />
    </>
  );
}
