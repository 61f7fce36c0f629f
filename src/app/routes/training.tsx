import { useSearchParams } from 'react-router';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { TrainingScreen } from '../../features/training/components/training-screen';

export function TrainingRoute() {
  const me = useCurrentUser();
  const raw = Number(useSearchParams()[0].get('procedure'));
  return (
    <>
      <title>Training · Asepta</title>
      <TrainingScreen role={me.role} procedureId={Number.isInteger(raw) && raw > 0 ? raw : undefined} />
    </>
  );
}
