import { useParams } from 'react-router';
import { NotFound } from '../../components/errors/not-found';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { ProcedureScreen } from '../../features/procedures/components/procedure-screen';

export function ProcedureRoute() {
  const me = useCurrentUser();
  const id = Number(useParams().id);
  if (!Number.isInteger(id) || id < 1) return <NotFound />;
  return (
    <>
      <title>Procedure · Asepta</title>
      <ProcedureScreen id={id} role={me.role} />
    </>
  );
}
