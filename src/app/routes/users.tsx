import { useCurrentUser } from '../../features/auth/api/use-me';
import { UsersScreen } from '../../features/users/components/users-screen';

export function UsersRoute() {
  const me = useCurrentUser();
  return (
    <>
      <title>Users · Asepta</title>
      <UsersScreen currentUserId={me.id} />
    </>
  );
}
