import { productionRoles } from '../../config/roles';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { GrainScreen } from '../../features/grain/components/grain-screen';

export function GrainRoute() {
  const me = useCurrentUser();
  return (
    <>
      <title>Grain · Asepta</title>
      <GrainScreen
        canWrite={productionRoles.write.includes(me.role)}
        canAddGrain={productionRoles.addGrain.includes(me.role)}
      />
    </>
  );
}
