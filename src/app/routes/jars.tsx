import { productionRoles } from '../../config/roles';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { JarsScreen } from '../../features/jars/components/jars-screen';

export function JarsRoute() {
  const me = useCurrentUser();
  return (
    <>
      <title>Jars · Asepta</title>
      <JarsScreen canWrite={productionRoles.write.includes(me.role)} />
    </>
  );
}
