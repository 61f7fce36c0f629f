import { useQuery } from '@tanstack/react-query';
import { RegisterScreen } from '../../../components/layouts/register-screen';
import { useListParams } from '../../../lib/use-list-params';
import { actionsQueries, readActionFilters } from '../api/actions-queries';
import { actionColumns } from './actions-columns';
import { ActionsFilters, isActionFiltered } from './actions-filters';

/** Every corrective action of the lab, with who answers for it and by when. */
export function ActionsScreen() {
  const params = useListParams(readActionFilters);
  const { filters, update } = params;
  const list = useQuery(actionsQueries.list(filters));
  return (
    <RegisterScreen
      title="Corrective actions"
      description="Each action answers an incident and has one owner and a due date. Owners are e-mailed when given an action and reminded once when it is overdue; closing one records how the fix was verified."
      filters={<ActionsFilters filters={filters} onChange={update} />}
      columns={actionColumns}
      query={list}
      params={params}
      empty={{
        filtered: isActionFiltered(filters),
        none: 'No corrective actions yet. A supervisor adds them on an incident’s page.',
        noMatch: 'No corrective actions match these filters.',
      }}
    />
  );
}
