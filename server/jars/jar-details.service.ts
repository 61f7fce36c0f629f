import type { EntityManager } from 'typeorm';
import type { Jar } from './jar.entity';
import { jarsRepository } from './jars.repository';
import { recountJars } from '../tallies/tallies.service';

/** What a history file leaves out about a jar: where it stands, its inoculum, its batch and its dates. */
export type JarDetails = Partial<
  Pick<Jar, 'room' | 'shelf' | 'inoculumMl' | 'colonisedOn' | 'prepBatchId' | 'parentJarId' | 'cultureId'>
>;

export const anyJarStored = () => jarsRepository.any();

/** The stored jars among the labels: id, label and status. */
export const jarsByLabels = (m: EntityManager, labels: string[]) => jarsRepository.findByLabels(m, labels);

/** Inside the caller's transaction (the demo loader's): the same details on each of the jars, then counted again. */
export async function setJarDetails(m: EntityManager, ids: number[], details: JarDetails): Promise<void> {
  await jarsRepository.updateByIds(m, ids, details);
  await recountJars(m, ids);
}

/**
 * A grain-to-grain jar takes its inoculum from the parent jar, not from a culture. Jars already made from
 * this one count for its root culture and their transfers too, so they are counted again with it.
 */
export async function setParentJar(m: EntityManager, id: number, parentJarId: number): Promise<void> {
  await jarsRepository.updateByIds(m, [id], { parentJarId, cultureId: null });
  await recountJars(m, await jarsRepository.idsFromJar(m, id));
}
