import { useSearchParams } from 'react-router';
import { idSchema } from '../../../shared/schemas/common';
import { MakeJarsForm } from '../../features/jars/components/make-jars-form';

export function NewJarsRoute() {
  const [params] = useSearchParams();
  const session = idSchema.safeParse(params.get('session') ?? undefined);
  return (
    <>
      <title>Make jars · Asepta</title>
      <MakeJarsForm sessionId={session.success ? session.data : undefined} />
    </>
  );
}
