import type { Role } from '../../../shared/enums';
import { access } from '../../config/roles';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { ShelfWalkScreen } from '../../features/jars/components/shelf-walk-screen';

export function ShelfWalkRoute() {
  const me = useCurrentUser();
  return (
    <>
      <title>Shelf walk · Asepta</title>
      <ShelfWalkScreen canFlag={(access.flagJar as readonly Role[]).includes(me.role)} />
    </>
  );
}
