import type { EntityManager } from 'typeorm';
import { dataSource } from '../db/data-source';
import { LabSettings } from './lab-settings.entity';

/** The lab has one settings row, id 1. */
export const settingsRepository = {
  find: (m: EntityManager = dataSource.manager) => m.findOneBy(LabSettings, { id: 1 }),
  lock: (m: EntityManager) => m.findOne(LabSettings, { where: { id: 1 }, lock: { mode: 'pessimistic_write' } }),
  /** Read-locked: a settings change still open is waited for, not read around. */
  share: (m: EntityManager) => m.findOne(LabSettings, { where: { id: 1 }, lock: { mode: 'pessimistic_read' } }),
  save: (m: EntityManager, row: LabSettings) => m.save(row),
};
