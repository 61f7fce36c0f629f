import type { HoldResultDto, LineageNodeDto, LineageTreeDto, RecallRowDto } from '../../shared/schemas/jar-lineage';
import { recordAudit, type Actor } from '../audit/audit.service';
import { notFound } from '../core/errors';
import { dataSource } from '../db/data-source';
import { holdLockedJars } from '../jars/jar-events.service';
import { holdable } from '../jars/jar-life';
import { dateOnly, dateOrNull } from '../core/raw-values';
import { lineageRepository, type LineageCultureRaw, type LineageJarRaw } from './lineage.repository';

const jarNode = (j: LineageJarRaw): LineageNodeDto => ({
  kind: 'jar',
  id: j.id,
  label: j.label,
  status: j.status,
  inoculatedOn: dateOnly(j.inoculatedOn),
  releasedTo: j.releasedTo,
  releasedToWho: j.releasedToWho,
  releasedOn: j.status === 'released' ? (dateOrNull(j.releasedOn) ?? dateOrNull(j.endedOn)) : null,
});

/** Assembles the flat rows of the recursive queries into {node, children}: child cultures first, then jars. */
function buildTree(rootKey: string, cultures: LineageCultureRaw[], jars: LineageJarRaw[]): LineageTreeDto {
  const trees = new Map<string, LineageTreeDto>();
  for (const c of cultures)
    trees.set(`c${c.id}`, { node: { kind: 'culture', id: c.id, code: c.code, state: c.state }, children: [] });
  for (const j of jars) trees.set(`j${j.id}`, { node: jarNode(j), children: [] });
  for (const c of cultures)
    if (`c${c.id}` !== rootKey && c.parentCultureId)
      trees.get(`c${c.parentCultureId}`)?.children.push(trees.get(`c${c.id}`)!);
  for (const j of jars) {
    if (`j${j.id}` === rootKey) continue;
    const parent = j.parentJarId
      ? trees.get(`j${j.parentJarId}`)
      : j.cultureId
        ? trees.get(`c${j.cultureId}`)
        : undefined;
    parent?.children.push(trees.get(`j${j.id}`)!);
  }
  return trees.get(rootKey)!;
}

export async function cultureLineage(cultureId: number): Promise<LineageTreeDto> {
  const cultures = await lineageRepository.culturesBelow(cultureId);
  if (cultures.length === 0) throw notFound('Culture');
  return buildTree(`c${cultureId}`, cultures, await lineageRepository.jarsBelowCulture(cultureId));
}

export async function jarLineage(jarId: number): Promise<LineageTreeDto> {
  const jars = await lineageRepository.jarsBelowJar(jarId);
  if (jars.length === 0) throw notFound('Jar');
  return buildTree(`j${jarId}`, [], jars);
}

const recallRow = (j: LineageJarRaw): RecallRowDto => {
  const n = jarNode(j) as Extract<LineageNodeDto, { kind: 'jar' }>;
  return { label: n.label, releasedTo: n.releasedTo, releasedToWho: n.releasedToWho, releasedOn: n.releasedOn };
};

/**
 * One transaction: finds every descendant, locks them, holds the incubating and colonised ones
 * (an event and an audit event each) and lists the released ones for recall.
 */
export async function holdLineage(
  actor: Actor,
  root: { kind: 'culture' | 'jar'; id: number },
  reason: string,
): Promise<HoldResultDto> {
  return dataSource.transaction(async (m) => {
    let jars: LineageJarRaw[];
    if (root.kind === 'culture') {
      if ((await lineageRepository.culturesBelow(root.id, m)).length === 0) throw notFound('Culture');
      jars = await lineageRepository.jarsBelowCulture(root.id, m);
    } else {
      jars = await lineageRepository.jarsBelowJar(root.id, m);
      if (jars.length === 0) throw notFound('Jar');
    }
    const locked = await lineageRepository.lockForHold(
      m,
      jars.map((j) => j.id),
    );
    const toHold = locked.filter((j) => holdable.includes(j.status));
    const fullReason = `${reason} (lineage hold from ${root.kind} ${root.id})`;
    const held = await holdLockedJars(m, actor, toHold, fullReason);
    await recordAudit(m, actor, [
      { action: 'lineage-hold', recordType: root.kind, recordId: root.id, newValue: { held: held.length }, reason },
    ]);
    const heldIds = new Set(toHold.map((j) => j.id));
    const status = new Map(locked.map((j) => [j.id, j.status]));
    return {
      held,
      recall: jars.filter((j) => status.get(j.id) === 'released').map(recallRow),
      unchanged: jars
        .filter((j) => !heldIds.has(j.id) && status.get(j.id) !== 'released')
        .map((j) => ({ label: j.label, status: status.get(j.id) ?? j.status })),
    };
  });
}
