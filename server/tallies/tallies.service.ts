import type { EntityManager } from 'typeorm';
import { dataSource } from '../db/data-source';
import { committedWindowDays } from '../settings/settings.service';
import { everyJar, theseJars } from './jar-keys.sql';
import { talliesRepository } from './tallies.repository';

/** Ids per statement: well under MariaDB's limits, and a recount's locks stay short-lived per statement. */
const CHUNK = 5_000;

/**
 * Counts the jars again in the caller's transaction, after a write that may change how they count:
 * a jar made or imported, a move, an incident filed, edited, reviewed or voided. Safe to call for jars
 * whose counts did not change. The settings row is read-locked before the tally lock, in the order a
 * settings change takes them, so the two cannot deadlock.
 */
export async function recountJars(m: EntityManager, jarIds: Iterable<number>): Promise<void> {
  const ids = [...new Set(jarIds)].sort((a, b) => a - b);
  if (ids.length === 0) return;
  const windowDays = await committedWindowDays(m);
  await talliesRepository.lock(m);
  for (let i = 0; i < ids.length; i += CHUNK) {
    const jars = theseJars(ids.slice(i, i + CHUNK));
    await talliesRepository.forget(m, jars);
    await talliesRepository.count(m, jars, windowDays);
  }
}

/**
 * After a change of observation window: a clean jar's room in the counts is where it stood at the end of
 * its window, so only jars that have moved can count elsewhere now.
 */
export async function recountMovedJars(m: EntityManager): Promise<void> {
  await recountJars(m, await talliesRepository.movedJarIds(m));
}

/** Recomputes every count from the records: `npm run tallies:rebuild`, the demo lab. */
export async function rebuildTallies(m?: EntityManager): Promise<void> {
  if (!m) return dataSource.transaction((t) => rebuildTallies(t));
  const windowDays = await committedWindowDays(m);
  await talliesRepository.lock(m);
  await talliesRepository.clear(m);
  await talliesRepository.count(m, everyJar, windowDays);
  await talliesRepository.markRebuilt(m);
}
