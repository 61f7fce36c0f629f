import { useParams } from 'react-router';
import { NotFound } from '../../components/errors/not-found';
import { productionRoles } from '../../config/roles';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { CookRunDetail } from '../../features/cook-runs/components/cook-run-detail';

export function CookRunRoute() {
  const me = useCurrentUser();
  const id = Number(useParams().id);
  if (!Number.isInteger(id) || id < 1) return <NotFound />;
  return (
    <>
      <title>Cook run · Asepta</title>
      <CookRunDetail id={id} canWrite={productionRoles.write.includes(me.role)} />
    </>
  );
}
