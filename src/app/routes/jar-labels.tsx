import { useSearchParams } from 'react-router';
import { idSchema } from '../../../shared/schemas/common';
import { LabelSheet, type LabelLayout } from '../../features/jars/components/label-sheet';

export function JarLabelsRoute() {
  const [params, setParams] = useSearchParams();
  const session = idSchema.safeParse(params.get('session') ?? undefined);
  const ids = params.get('ids') ?? undefined;
  const layout: LabelLayout = params.get('layout') === 'roll' ? 'roll' : 'sheet';
  const query = session.success ? { sessionId: session.data } : { ids };
  return (
    <>
      <title>Jar labels · Asepta</title>
      <LabelSheet
        query={query}
        layout={layout}
        onLayout={(next) => {
          const p = new URLSearchParams(params);
          p.set('layout', next);
          setParams(p, { replace: true });
        }}
      />
    </>
  );
}
