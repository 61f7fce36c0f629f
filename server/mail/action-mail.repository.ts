import type { EntityManager } from 'typeorm';
import { dataSource } from '../db/data-source';
import { dateText } from '../core/calendar';

export interface ActionMailRow {
  id: number;
  incidentId: number;
  what: string;
  ownerId: number | null;
  ownerName: string;
  ownerEmail: string | null;
  dueOn: string;
}

type Raw = Record<string, unknown>;
const day = (v: unknown) => dateText(v) ?? '';
const toRow = (r: Raw): ActionMailRow => ({
  id: Number(r.id),
  incidentId: Number(r.incidentId),
  what: String(r.what),
  ownerId: r.ownerId === null ? null : Number(r.ownerId),
  ownerName: String(r.ownerName),
  ownerEmail: typeof r.ownerEmail === 'string' ? r.ownerEmail : null,
  dueOn: day(r.dueOn),
});
const columns = 'a.id, a.incidentId, a.what, a.ownerId, a.ownerName, a.ownerEmail, a.dueOn';

export const actionMailRepository = {
  async find(id: number): Promise<ActionMailRow | null> {
    const rows = await dataSource.query<Raw[]>(`SELECT ${columns} FROM corrective_actions a WHERE a.id = ?`, [id]);
    return rows[0] ? toRow(rows[0]) : null;
  },

  markAssigned: (id: number) =>
    dataSource.query('UPDATE corrective_actions SET assignedMailAt = NOW(6) WHERE id = ?', [id]),

  /** Open actions past due whose reminder has not gone, on incidents that still stand. */
  async overdue(m: EntityManager, today: string): Promise<ActionMailRow[]> {
    const rows = await m.query<Raw[]>(
      `SELECT ${columns} FROM corrective_actions a JOIN incidents i ON i.id = a.incidentId
        WHERE a.doneOn IS NULL AND a.dueOn < ? AND a.overdueMailAt IS NULL AND i.voided = 0
        ORDER BY a.dueOn, a.id`,
      [today],
    );
    return rows.map(toRow);
  },

  /** Claims the one reminder: only the caller whose update changed the row sends it. */
  async claimOverdue(m: EntityManager, id: number): Promise<boolean> {
    const res = await m.query<{ affectedRows: number }>(
      'UPDATE corrective_actions SET overdueMailAt = NOW(6) WHERE id = ? AND overdueMailAt IS NULL',
      [id],
    );
    return Number(res.affectedRows) === 1;
  },
};
