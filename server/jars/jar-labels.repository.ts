import type { EntityManager } from 'typeorm';
import { likePrefix } from '../core/paging';
import { Jar } from './jar.entity';
import { sequencedLabelSql } from './label-sequence';

/** The labels already numbered, read to continue the lab's sequence. */
export const jarLabelsRepository = {
  /** The label of the latest jar numbered in sequence: it sets the lab's label format. */
  async latestSequencedLabel(m: EntityManager): Promise<string | null> {
    const raw = await m
      .createQueryBuilder(Jar, 'j')
      .select('j.label', 'label')
      .where('j.label REGEXP :pattern', { pattern: sequencedLabelSql })
      .orderBy('j.id', 'DESC')
      .limit(1)
      .getRawOne<{ label: string }>();
    return raw?.label ?? null;
  },

  /**
   * The digits of the highest label under the prefix, compared as text (length, then value) so that
   * no number is ever rounded; call after lockSequences.
   */
  async highestLabelDigits(m: EntityManager, prefix: string): Promise<string | null> {
    const digits = `TRIM(LEADING '0' FROM SUBSTRING(j.label, ${prefix.length + 1}))`;
    const raw = await m
      .createQueryBuilder(Jar, 'j')
      .select(digits, 'digits')
      .where('j.label LIKE :start', { start: likePrefix(prefix) })
      .andWhere('j.label REGEXP :pattern', { pattern: `^${prefix}[0-9]+$` })
      .orderBy(`CHAR_LENGTH(${digits})`, 'DESC')
      .addOrderBy(digits, 'DESC')
      .limit(1)
      .getRawOne<{ digits: string }>();
    return raw ? raw.digits || '0' : null;
  },
};
