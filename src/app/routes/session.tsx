import { useParams } from 'react-router';
import { NotFound } from '../../components/errors/not-found';
import { productionRoles } from '../../config/roles';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { SessionJars } from '../../features/jars/components/session-jars';
import { SessionDetail } from '../../features/sessions/components/session-detail';

export function SessionRoute() {
  const me = useCurrentUser();
  const id = Number(useParams().id);
  if (!Number.isInteger(id) || id < 1) return <NotFound />;
  const canWrite = productionRoles.write.includes(me.role);
  return (
    <>
      <title>Inoculation session · Asepta</title>
      <SessionDetail id={id} canWrite={canWrite} jars={<SessionJars key={id} sessionId={id} canWrite={canWrite} />} />
    </>
  );
}
