import { useParams } from 'react-router';
import { NotFound } from '../../components/errors/not-found';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { VersionScreen } from '../../features/procedures/components/version-screen';

export function ProcedureVersionRoute() {
  const me = useCurrentUser();
  const id = Number(useParams().id);
  if (!Number.isInteger(id) || id < 1) return <NotFound />;
  return (
    <>
      <title>Procedure version · Asepta</title>
      <VersionScreen id={id} role={me.role} />
    </>
  );
}
