import { In, type EntityManager } from 'typeorm';
import type { StaffListQuery } from '../../shared/schemas/staff';
import { applySortAndPage, whereContains } from '../core/paging';
import { dataSource } from '../db/data-source';
import { StaffMember } from './staff-member.entity';

const sortable = { name: 's.name', createdAt: 's.createdAt', active: 's.active' };

export const staffRepository = {
  list(q: StaffListQuery) {
    const qb = dataSource.getRepository(StaffMember).createQueryBuilder('s');
    whereContains(qb, ['s.name', 's.email'], q.q);
    if (q.active) qb.andWhere('s.active = :active', { active: q.active === 'true' });
    return applySortAndPage(qb, q, sortable, 'name', 's.id').getManyAndCount();
  },

  findById: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(StaffMember, { id }),
  insert: (m: EntityManager, fields: Partial<StaffMember>) => m.save(m.create(StaffMember, fields)),
  save: (m: EntityManager, member: StaffMember) => m.save(member),

  /** The table's collation ignores case, so this finds "ana" when "Ana" is stored. */
  findByName: (name: string, m: EntityManager = dataSource.manager) => m.findOneBy(StaffMember, { name }),

  findByNames: (names: string[], m: EntityManager) =>
    names.length ? m.find(StaffMember, { where: { name: In(names) } }) : Promise.resolve([]),

  /** Adds the names not yet stored; a name stored in another case is left as it is. */
  async insertMissing(names: string[], m: EntityManager) {
    if (!names.length) return;
    await m
      .createQueryBuilder()
      .insert()
      .into(StaffMember)
      .values(names.map((name) => ({ name })))
      .orIgnore()
      .execute();
  },
};
