import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { RegisterScreen } from '../../../components/layouts/register-screen';
import { Button } from '../../../components/ui/button';
import { useListParams } from '../../../lib/use-list-params';
import { culturesExportUrl, culturesQueries, readCultureFilters } from '../api/cultures-queries';
import { CreateCultureDialog } from './create-culture-dialog';
import { cultureColumns } from './cultures-columns';
import { CulturesFilters } from './cultures-filters';

export function CulturesScreen({ canWrite }: { canWrite: boolean }) {
  const params = useListParams(readCultureFilters);
  const { filters, update } = params;
  const list = useQuery(culturesQueries.list(filters));
  const [creating, setCreating] = useState(false);

  return (
    <RegisterScreen
      title="Cultures"
      description="Syringes and liquid-culture lots. A culture is quarantined until a supervisor releases it; using one that is not released is flagged."
      exportHref={culturesExportUrl(filters)}
      actions={
        canWrite && (
          <Button icon="plus" onClick={() => setCreating(true)}>
            New culture
          </Button>
        )
      }
      filters={<CulturesFilters filters={filters} onChange={update} />}
      columns={cultureColumns}
      query={list}
      params={params}
      empty={{
        filtered: Boolean(filters.q || filters.state),
        none: 'No cultures recorded yet.',
        noMatch: 'No cultures match these filters.',
        onClear: () => update({ q: undefined, state: undefined }),
      }}
    >
      {canWrite && <CreateCultureDialog open={creating} onClose={() => setCreating(false)} />}
    </RegisterScreen>
  );
}
