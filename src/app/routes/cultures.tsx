import { productionRoles } from '../../config/roles';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { CulturesScreen } from '../../features/cultures/components/cultures-screen';

export function CulturesRoute() {
  const me = useCurrentUser();
  return (
    <>
      <title>Cultures · Asepta</title>
      <CulturesScreen canWrite={productionRoles.write.includes(me.role)} />
    </>
  );
}
