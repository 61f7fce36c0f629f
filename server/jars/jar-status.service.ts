import type { EntityManager } from 'typeorm';
import type { JarStatus } from '../../shared/enums';
import type { JarEvent } from './jar-event.entity';
import type { Jar } from './jar.entity';
import { jarStatusRepository } from './jar-status.repository';

/** A stored jar and one of its events, as other modules read them. */
export type JarRecord = Jar;
export type JarEventRecord = JarEvent;

/** For the incidents module, which decides each jar's status from its live incidents. */
export const lockJarsForStatus = (m: EntityManager, ids: number[]) => jarStatusRepository.lockByIds(m, ids);
/** The jars among `ids` with a live incident. */
export const contaminatedJarIds = (m: EntityManager, ids: number[]) => jarStatusRepository.contaminatedIds(m, ids);
export const jarEventsOf = (m: EntityManager, ids: number[]) => jarStatusRepository.eventsOf(m, ids);

export const insertJarEvent = (m: EntityManager, event: Partial<JarEvent>) => jarStatusRepository.insertEvent(m, event);
export const setJarStatus = (m: EntityManager, id: number, status: JarStatus) =>
  jarStatusRepository.setStatus(m, id, status);
