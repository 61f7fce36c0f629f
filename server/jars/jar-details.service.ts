import type { EntityManager } from 'typeorm';
import type { Jar } from './jar.entity';
import { jarsRepository } from './jars.repository';

/** What a history file leaves out about a jar: where it stands, its inoculum, its batch and its dates. */
export type JarDetails = Partial<
  Pick<Jar, 'room' | 'shelf' | 'inoculumMl' | 'colonisedOn' | 'prepBatchId' | 'parentJarId' | 'cultureId'>
>;

export const anyJarStored = () => jarsRepository.any();

/** The stored jars among the labels: id, label and status. */
export const jarsByLabels = (m: EntityManager, labels: string[]) => jarsRepository.findByLabels(m, labels);

/** Inside the caller's transaction (the demo loader's): the same details on each of the jars. */
export const setJarDetails = (m: EntityManager, ids: number[], details: JarDetails) =>
  jarsRepository.updateByIds(m, ids, details);

/** A grain-to-grain jar takes its inoculum from the parent jar, not from a culture. */
export const setParentJar = (m: EntityManager, id: number, parentJarId: number) =>
  jarsRepository.updateByIds(m, [id], { parentJarId, cultureId: null });
