import { In, type EntityManager } from 'typeorm';
import { dataSource } from '../db/data-source';
import { Photo } from './photo.entity';

export const photosRepository = {
  findById: (id: number, manager: EntityManager = dataSource.manager) => manager.findOneBy(Photo, { id }),
  findByIds: (ids: number[], manager: EntityManager = dataSource.manager) =>
    ids.length ? manager.findBy(Photo, { id: In(ids) }) : Promise.resolve([]),
  findBySha: (hashes: string[], manager: EntityManager = dataSource.manager) =>
    hashes.length ? manager.findBy(Photo, { sha256: In(hashes) }) : Promise.resolve([]),
  exists: (m: EntityManager, id: number) => m.existsBy(Photo, { id }),
  insert: (m: EntityManager, fields: Partial<Photo>) => m.save(m.create(Photo, fields)),
};
