import { productionRoles } from '../../config/roles';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { SessionsScreen } from '../../features/sessions/components/sessions-screen';

export function SessionsRoute() {
  const me = useCurrentUser();
  return (
    <>
      <title>Inoculation sessions · Asepta</title>
      <SessionsScreen canWrite={productionRoles.write.includes(me.role)} me={me} />
    </>
  );
}
