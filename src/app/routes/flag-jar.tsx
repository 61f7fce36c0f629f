import { useSearchParams } from 'react-router';
import { jarLabelSchema } from '../../../shared/schemas/incidents';
import { FlagJarScreen } from '../../features/incidents/components/flag-jar-screen';

export function FlagJarRoute() {
  const [params] = useSearchParams();
  const parsed = jarLabelSchema.safeParse(params.get('jar') ?? '');
  return (
    <>
      <title>Flag a jar · Asepta</title>
      <FlagJarScreen jarLabel={parsed.success ? parsed.data : undefined} />
    </>
  );
}
