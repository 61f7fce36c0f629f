import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { RegisterScreen } from '../../../components/layouts/register-screen';
import { Button } from '../../../components/ui/button';
import { useListParams } from '../../../lib/use-list-params';
import { cookRunsExportUrl, cookRunsQueries, readCookRunFilters } from '../api/cook-runs-queries';
import { cookRunColumns } from './cook-runs-columns';
import { CookRunsFilters, isCookRunFiltered } from './cook-runs-filters';
import { CreateCookRunDialog } from './create-cook-run-dialog';

interface Props {
  canWrite: boolean;
  me: { id: number; displayName: string };
}

export function CookRunsScreen({ canWrite, me }: Props) {
  const params = useListParams(readCookRunFilters);
  const { filters, update } = params;
  const list = useQuery(cookRunsQueries.list(filters));
  const [creating, setCreating] = useState(false);

  return (
    <RegisterScreen
      title="Cook runs"
      description="Each sterilisation load with its lethality. Without a temperature log, F0 is an estimate from the chamber temperature — an upper bound, because the centre of a jar lags behind."
      exportHref={cookRunsExportUrl(filters)}
      actions={
        canWrite && (
          <Button icon="plus" onClick={() => setCreating(true)}>
            New cook run
          </Button>
        )
      }
      filters={<CookRunsFilters filters={filters} onChange={update} />}
      columns={cookRunColumns}
      query={list}
      params={params}
      empty={{
        filtered: isCookRunFiltered(filters),
        none: 'No cook runs recorded yet.',
        noMatch: 'No cook runs match these filters.',
      }}
    >
      {canWrite && <CreateCookRunDialog open={creating} onClose={() => setCreating(false)} me={me} />}
    </RegisterScreen>
  );
}
