import { In, type EntityManager, type QueryDeepPartialEntity, type SelectQueryBuilder } from 'typeorm';
import type { PageQuery } from '../../shared/schemas/common';
import type { CultureFilters, CultureListQuery } from '../../shared/schemas/cultures';
import { allSorted, pageSorted, whereContains, type PageTotal, type SortSpec } from '../core/paging';
import { findByValues, insertMany } from '../db/bulk';
import { dataSource } from '../db/data-source';
import { Photo } from '../photos/photo.entity';
import { AgarTest } from './agar-test.entity';
import { Culture } from './culture.entity';

const sort: SortSpec = {
  sortable: { code: 'c.code', preparedOn: 'c.preparedOn', state: 'c.state', species: 'c.species' },
  defaultSort: 'code',
  tieBreak: 'c.id',
  unique: ['c.code'],
};

function filtered(f: CultureFilters): SelectQueryBuilder<Culture> {
  const qb = dataSource.manager.createQueryBuilder(Culture, 'c');
  if (f.state) qb.andWhere('c.state = :state', { state: f.state });
  return whereContains(qb, ['c.code', 'c.species', 'c.strain'], f.q);
}

export const culturesRepository = {
  findById: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(Culture, { id }),
  findByCode: (code: string, m: EntityManager = dataSource.manager) => m.findOneBy(Culture, { code }),
  findByCodes: (m: EntityManager, codes: string[]) =>
    findByValues(m, Culture, 'code', codes, { id: true, code: true, state: true }),
  insertMany: (m: EntityManager, rows: QueryDeepPartialEntity<Culture>[]) => insertMany(m, Culture, rows),
  save: (m: EntityManager, culture: Culture) => m.save(culture),
  updateByCode: (m: EntityManager, code: string, fields: Partial<Culture>) => m.update(Culture, { code }, fields),
  byIds: async (ids: number[]) => (ids.length ? dataSource.manager.findBy(Culture, { id: In(ids) }) : []),
  children: (id: number) =>
    dataSource.manager.find(Culture, { where: { parentCultureId: id }, order: { code: 'ASC' } }),
  agarTests: (cultureId: number) =>
    dataSource.manager.find(AgarTest, { where: { cultureId }, order: { testedOn: 'DESC', id: 'DESC' } }),
  setState: (m: EntityManager, id: number, state: Culture['state']) => m.update(Culture, { id }, { state }),
  insertAgarTest: (m: EntityManager, fields: Partial<AgarTest>) => m.save(m.create(AgarTest, fields)),
  photoExists: async (id: number, m: EntityManager) => (await m.countBy(Photo, { id })) > 0,

  list: (q: CultureListQuery): Promise<[Culture[], PageTotal]> => pageSorted(filtered(q), q, sort),
  all: (q: CultureFilters & Pick<PageQuery, 'sort'>) => allSorted(() => filtered(q), q.sort, sort),

  /** Ancestors of a culture, nearest first; bounded so a corrupt loop cannot hang a request. */
  async ancestorIds(id: number, m: EntityManager): Promise<number[]> {
    const seen: number[] = [];
    let current = await m.findOneBy(Culture, { id });
    while (current?.parentCultureId && seen.length < 100 && !seen.includes(current.parentCultureId)) {
      seen.push(current.parentCultureId);
      current = await m.findOneBy(Culture, { id: current.parentCultureId });
    }
    return seen;
  },
};
