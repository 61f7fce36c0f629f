import type { Role } from '../../../shared/enums';
import { useParams } from 'react-router';
import { NotFound } from '../../components/errors/not-found';
import { access, productionRoles } from '../../config/roles';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { JarPage } from '../../features/jars/components/jar-page';

/** /j/:label — the address printed in every jar's QR code. */
export function JarRoute() {
  const me = useCurrentUser();
  const label = useParams().label?.trim();
  if (!label) return <NotFound />;
  return (
    <>
      <title>{`Jar ${label} · Asepta`}</title>
      <JarPage
        key={label}
        label={label}
        role={me.role}
        canWrite={productionRoles.write.includes(me.role)}
        canFlag={(access.flagJar as readonly Role[]).includes(me.role)}
      />
    </>
  );
}
