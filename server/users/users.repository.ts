import type { EntityManager } from 'typeorm';
import type { UserListQuery } from '../../shared/schemas/users';
import { sortColumn } from '../core/paging';
import { dataSource } from '../db/data-source';
import { User } from './user.entity';

const sortable = {
  username: 'u.username',
  displayName: 'u.displayName',
  role: 'u.role',
  createdAt: 'u.createdAt',
} as const;

export const usersRepository = {
  findById: (id: number, manager: EntityManager = dataSource.manager) => manager.findOneBy(User, { id }),
  findActive: (id: number, manager: EntityManager = dataSource.manager) =>
    manager.findOneBy(User, { id, active: true }),
  findByUsername: (username: string) => dataSource.manager.findOneBy(User, { username }),
  insert: (m: EntityManager, fields: Partial<User>) => m.save(m.create(User, fields)),
  save: (m: EntityManager, user: User) => m.save(user),
  setOwnPassword: (m: EntityManager, id: number, passwordHash: string) =>
    m.update(User, { id }, { passwordHash, mustChangePassword: false }),
  accountNames: (m: EntityManager) => m.find(User, { select: { id: true, username: true, displayName: true } }),
  activePeople: () =>
    dataSource.manager.find(User, {
      select: { id: true, displayName: true, role: true },
      where: { active: true },
      order: { displayName: 'ASC', id: 'ASC' },
    }),

  async list(q: UserListQuery): Promise<[User[], number]> {
    const qb = dataSource.manager.createQueryBuilder(User, 'u');
    if (q.role) qb.andWhere('u.role = :role', { role: q.role });
    if (q.active) qb.andWhere('u.active = :active', { active: q.active === 'true' });
    if (q.q) qb.andWhere('(u.username LIKE :q OR u.displayName LIKE :q)', { q: `%${q.q}%` });
    const { column, desc } = sortColumn(sortable, q.sort ?? 'username');
    qb.orderBy(column, desc ? 'DESC' : 'ASC').addOrderBy('u.id', 'ASC');
    return qb
      .skip((q.page - 1) * q.pageSize)
      .take(q.pageSize)
      .getManyAndCount();
  },
};
