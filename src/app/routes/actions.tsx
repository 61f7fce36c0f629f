import { ActionsScreen } from '../../features/actions/components/actions-screen';

export function ActionsRoute() {
  return (
    <>
      <title>Corrective actions · Asepta</title>
      <ActionsScreen />
    </>
  );
}
