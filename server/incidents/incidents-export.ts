import { contaminantNames } from '../../shared/enums';
import type { IncidentListQuery } from '../../shared/schemas/incidents';
import { todayLocal } from '../core/local-time';
import { incidentsRepository } from './incidents.repository';

/** A register export is a working copy, not a backup: capped so one click cannot exhaust the server. */
export const exportCap = 20_000;

const header = [
  'id',
  'found_at_utc',
  'found_on',
  'found_by',
  'stage',
  'contaminant',
  'contaminant_name',
  'severity',
  'status',
  'verdict',
  'voided',
  'void_reason',
  'jars',
  'jar_count',
  'cook_runs',
  'cultures',
  'sessions',
  'sign_colour',
  'sign_smell',
  'sign_texture',
  'sealed',
  'sterilised_before_disposal',
  'cause_category',
  'root_cause_notes',
  'notes',
];

async function exportRows(q: IncidentListQuery): Promise<unknown[][]> {
  const incidents = await incidentsRepository.listAll(q, q.sort, exportCap);
  const codes = await incidentsRepository.jarCodes(incidents.map((i) => i.id));
  const yesNo = (b: boolean) => (b ? 'yes' : 'no');
  const rows = incidents.map((i) => {
    const c = codes.get(i.id);
    return [
      i.id,
      i.foundAt,
      i.foundOn,
      i.foundByName,
      i.stage,
      i.contaminant,
      contaminantNames[i.contaminant],
      i.severity,
      i.status,
      i.verdict,
      yesNo(i.voided),
      i.voidReason,
      c?.labels.join(' '),
      c?.labels.length ?? 0,
      c?.cookRuns.join(' '),
      c?.cultures.join(' '),
      c?.sessions.join(' '),
      i.signColour,
      i.signSmell,
      i.signTexture,
      yesNo(i.sealed),
      yesNo(i.sterilisedBeforeDisposal),
      i.causeCategory,
      i.rootCauseNotes,
      i.notes,
    ];
  });
  return rows;
}

export const incidentCsv = {
  rows: exportRows,
  filename: () => `incidents-${todayLocal()}.csv`,
  header,
  row: (r: unknown[]) => r,
};
