import { productionRoles } from '../../config/roles';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { CookRunsScreen } from '../../features/cook-runs/components/cook-runs-screen';

export function CookRunsRoute() {
  const me = useCurrentUser();
  return (
    <>
      <title>Cook runs · Asepta</title>
      <CookRunsScreen canWrite={productionRoles.write.includes(me.role)} me={me} />
    </>
  );
}
