import type { EntityTarget, ObjectLiteral } from 'typeorm';
import { codeParts, nextCode } from '../../shared/codes/next-code';
import { dataSource } from '../db/data-source';
import { likePrefix } from './paging';

/** How far past a clash the suggestion looks before it gives the fallback's pattern up to the user. */
const maxTries = 20;

/**
 * The next free code of a register whose rows carry a unique `code`: the pattern of the row made last
 * (highest id), counted on from the highest number stored under that pattern. A suggestion only: the
 * create route still answers 409 if someone takes it first.
 */
export async function suggestCode<T extends ObjectLiteral>(entity: EntityTarget<T>, fallback: string): Promise<string> {
  const m = dataSource.manager;
  const latest = await m
    .createQueryBuilder(entity, 'r')
    .select('r.code', 'code')
    .orderBy('r.id', 'DESC')
    .limit(1)
    .getRawOne<{ code: string }>();
  const parts = latest ? codeParts(latest.code) : null;
  const others = parts
    ? (
        await m
          .createQueryBuilder(entity, 'r')
          .select('r.code', 'code')
          .where('r.code LIKE :prefix', { prefix: likePrefix(parts.prefix) })
          .getRawMany<{ code: string }>()
      ).map((r) => r.code)
    : [];
  let code = nextCode(latest?.code ?? null, others, fallback);
  for (let i = 0; i < maxTries; i += 1) {
    const taken = await m.createQueryBuilder(entity, 'r').where('r.code = :code', { code }).getExists();
    if (!taken) return code;
    code = nextCode(code, [], fallback);
  }
  return code;
}
