import type { Role } from '../../../shared/enums';
import { access } from '../../config/roles';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { IncidentsScreen } from '../../features/incidents/components/incidents-screen';

export function IncidentsRoute() {
  const me = useCurrentUser();
  return (
    <>
      <title>Incidents · Asepta</title>
      <IncidentsScreen canFlag={(access.flagJar as readonly Role[]).includes(me.role)} />
    </>
  );
}
