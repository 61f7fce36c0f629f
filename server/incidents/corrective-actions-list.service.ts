import type { Page } from '../../shared/schemas/common';
import type { ActionListItemDto, ActionListQuery } from '../../shared/schemas/corrective-actions';
import type { SessionUser } from '../core/auth-guards';
import { todayLocal } from '../core/local-time';
import { pageResult } from '../core/paging';
import { correctiveActionsRepository } from './corrective-actions.repository';
import { toActionDto } from './incidents.mapper';

/** The register of every corrective action, each with the incident it answers. */
export async function listActions(user: SessionUser, q: ActionListQuery): Promise<Page<ActionListItemDto>> {
  const today = todayLocal();
  const [rows, total] = await correctiveActionsRepository.list(q, user.id, today);
  const incidents = new Map(
    (await correctiveActionsRepository.incidentsOf([...new Set(rows.map((r) => r.incidentId))])).map((i) => [i.id, i]),
  );
  const items = rows.map((a) => {
    const i = incidents.get(a.incidentId);
    return {
      ...toActionDto(a, today),
      incident: {
        id: a.incidentId,
        contaminant: i?.contaminant ?? 'unknown',
        status: i?.status ?? 'open',
        foundOn: i?.foundOn ?? '',
        voided: i?.voided ?? false,
      },
    };
  });
  return pageResult(items, total, q);
}
