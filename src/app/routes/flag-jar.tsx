import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import { jarLabelFieldSchema } from '../../../shared/schemas/incidents';
import { FlagJarScreen, type OpenIncident } from '../../features/incidents/components/flag-jar-screen';
import { jarsQueries } from '../../features/jars/api/jars-queries';

export function FlagJarRoute() {
  const [params] = useSearchParams();
  const parsed = jarLabelFieldSchema.safeParse(params.get('jar') ?? '');
  const label = parsed.success ? parsed.data : undefined;
  // Offline the jar may be unknown to this phone: the flag is still taken, the check just does not show.
  const story = useQuery({ ...jarsQueries.byLabel(label ?? ''), enabled: Boolean(label), retry: false });
  const open = story.data?.incidents.find((i) => !i.voided && i.status !== 'closed');
  const openIncident: OpenIncident | undefined =
    open && story.data ? { id: open.id, foundOn: open.foundOn, label: story.data.jar.label } : undefined;
  return (
    <>
      <title>Flag a jar · Asepta</title>
      <FlagJarScreen jarLabel={label} openIncident={openIncident} />
    </>
  );
}
