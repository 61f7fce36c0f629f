import { useCurrentUser } from '../../features/auth/api/use-me';
import { ProceduresScreen } from '../../features/procedures/components/procedures-screen';

export function ProceduresRoute() {
  const me = useCurrentUser();
  return (
    <>
      <title>Procedures · Asepta</title>
      <ProceduresScreen role={me.role} />
    </>
  );
}
