import { useParams } from 'react-router';
import { NotFound } from '../../components/errors/not-found';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { LineageView } from '../../features/jars/components/lineage-view';

export function LineageRoute() {
  const me = useCurrentUser();
  const { kind, id: rawId } = useParams();
  const id = Number(rawId);
  if ((kind !== 'culture' && kind !== 'jar') || !Number.isInteger(id) || id < 1) return <NotFound />;
  return (
    <>
      <title>Where used · Asepta</title>
      <LineageView key={`${kind}${id}`} kind={kind} id={id} canHold={me.role === 'supervisor' || me.role === 'admin'} />
    </>
  );
}
