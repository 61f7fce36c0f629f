import type { EntityManager } from 'typeorm';
import { dataSource } from '../db/data-source';
import { LabSettings } from './lab-settings.entity';

/** The settings row is created by the LabDefaults migration, so it always exists. */
export async function getLabSettings(manager: EntityManager = dataSource.manager): Promise<LabSettings> {
  const row = await manager.findOneBy(LabSettings, { id: 1 });
  if (!row) throw new Error('lab_settings row 1 is missing: run the migrations');
  return row;
}
