import {
  actionFiltersSchema,
  actionPageSchema,
  actionSortFields,
  type ActionState,
} from '../../../../shared/schemas/corrective-actions';
import type { Factor } from '../../../../shared/enums';
import { readTableState, type TableState } from '../../../lib/list-params';
import { pagedListQuery, pickParam } from '../../../lib/list-query';

export interface ActionListFilters extends TableState {
  state: ActionState | undefined;
  mine: 'true' | undefined;
  incidentId: number | undefined;
  factor: Factor | undefined;
  level: string | undefined;
  q: string | undefined;
}

/** The URL is the list's source of truth; a filter the server would refuse is dropped, not sent. */
export function readActionFilters(params: URLSearchParams): ActionListFilters {
  const pick = <K extends 'state' | 'incidentId' | 'factor' | 'level' | 'q'>(key: K) =>
    pickParam(actionFiltersSchema.shape, params, key);
  const factor = pick('factor');
  return {
    ...readTableState(params, actionSortFields),
    state: pick('state'),
    mine: params.get('mine') === 'true' ? 'true' : undefined,
    incidentId: pick('incidentId'),
    factor,
    level: factor ? pick('level') : undefined,
    q: pick('q'),
  };
}

export const actionsQueries = {
  all: ['corrective-actions'] as const,
  lists: () => [...actionsQueries.all, 'list'] as const,
  list: (filters: ActionListFilters) =>
    pagedListQuery([...actionsQueries.lists(), filters] as const, '/corrective-actions', actionPageSchema, filters),
};
