import { In, type EntityManager } from 'typeorm';
import { jarIsContaminatedSql } from '../incidents/live-incidents';
import { JarEvent } from './jar-event.entity';
import { Jar } from './jar.entity';

/** The reads and writes that keep a jar's status in line with its incidents. */
export const jarStatusRepository = {
  lockByIds: (m: EntityManager, ids: number[]) =>
    m.createQueryBuilder(Jar, 'j').setLock('pessimistic_write').whereInIds(ids).getMany(),

  async contaminatedIds(m: EntityManager, ids: number[]): Promise<Set<number>> {
    const rows: { id: number }[] = await m
      .createQueryBuilder()
      .select('j.id', 'id')
      .from(Jar, 'j')
      .where('j.id IN (:...ids)', { ids })
      .andWhere(jarIsContaminatedSql('j.id'))
      .getRawMany();
    return new Set(rows.map((r) => Number(r.id)));
  },

  eventsOf: (m: EntityManager, ids: number[]) => m.findBy(JarEvent, { jarId: In(ids) }),
  insertEvent: (m: EntityManager, event: Partial<JarEvent>) => m.insert(JarEvent, event),
  setStatus: (m: EntityManager, id: number, status: Jar['status']) => m.update(Jar, { id }, { status }),
};
