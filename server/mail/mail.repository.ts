import type { EntityManager } from 'typeorm';
import type { Role, MailKind } from '../../shared/enums';
import type { SentMailListQuery } from '../../shared/schemas/mail';
import { pageSorted, type PageTotal } from '../core/paging';
import { dataSource } from '../db/data-source';
import { User } from '../users/user.entity';
import { MailPreference } from './mail-preference.entity';
import { SentMail } from './sent-mail.entity';

export interface Recipient {
  /** null for a staff person without an account, mailed at the address kept with the record. */
  userId: number | null;
  displayName: string;
  email: string;
}

const sentSortable = {
  createdAt: 'm.createdAt',
  kind: 'm.kind',
  status: 'm.status',
  to: 'm.toAddress',
  subject: 'm.subject',
};

export const mailRepository = {
  /** Active people in the roles with an address who have not turned this kind off. */
  async recipients(kind: MailKind, roles: readonly Role[], onlyUserId?: number): Promise<Recipient[]> {
    const qb = dataSource.manager
      .createQueryBuilder(User, 'u')
      .leftJoin(MailPreference, 'p', 'p.userId = u.id AND p.kind = :kind', { kind })
      .select(['u.id AS userId', 'u.displayName AS displayName', 'u.email AS email'])
      .where('u.active = 1')
      .andWhere("u.email IS NOT NULL AND u.email <> ''")
      .andWhere('COALESCE(p.enabled, 1) = 1')
      .orderBy('u.id', 'ASC');
    if (roles.length) qb.andWhere('u.role IN (:...roles)', { roles });
    if (onlyUserId !== undefined) qb.andWhere('u.id = :onlyUserId', { onlyUserId });
    const rows = await qb.getRawMany<{ userId: number | string; displayName: string; email: string }>();
    return rows.map((r) => ({ userId: Number(r.userId), displayName: r.displayName, email: r.email }));
  },

  preferences: (userId: number) => dataSource.manager.findBy(MailPreference, { userId }),

  async savePreferences(m: EntityManager, userId: number, changes: [MailKind, boolean][]): Promise<void> {
    if (changes.length === 0) return;
    await m.upsert(
      MailPreference,
      changes.map(([kind, enabled]) => ({ userId, kind, enabled })),
      ['userId', 'kind'],
    );
  },

  insertSent: (row: Omit<SentMail, 'id' | 'createdAt'>) =>
    dataSource.manager.save(dataSource.manager.create(SentMail, row)),

  listSent(q: SentMailListQuery): Promise<[SentMail[], PageTotal]> {
    const qb = dataSource.manager.createQueryBuilder(SentMail, 'm');
    if (q.kind) qb.andWhere('m.kind = :kind', { kind: q.kind });
    if (q.status) qb.andWhere('m.status = :status', { status: q.status });
    return pageSorted(qb, q, { sortable: sentSortable, defaultSort: '-createdAt', tieBreak: 'm.id' });
  },

  findSent: (id: number) => dataSource.manager.findOneBy(SentMail, { id }),
};
