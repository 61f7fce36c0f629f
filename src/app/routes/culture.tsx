import { useParams } from 'react-router';
import { NotFound } from '../../components/errors/not-found';
import { productionRoles } from '../../config/roles';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { CultureDetail } from '../../features/cultures/components/culture-detail';

export function CultureRoute() {
  const me = useCurrentUser();
  const id = Number(useParams().id);
  if (!Number.isInteger(id) || id < 1) return <NotFound />;
  return (
    <>
      <title>Culture · Asepta</title>
      <CultureDetail
        id={id}
        canWrite={productionRoles.write.includes(me.role)}
        canChangeState={productionRoles.changeCultureState.includes(me.role)}
      />
    </>
  );
}
