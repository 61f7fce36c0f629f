import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { digestTriggers, type DigestTrigger } from '../../shared/enums';

/** The unique week is the second guard, after GET_LOCK, against two app instances sending one digest twice. */
@Entity({ name: 'digest_runs' })
export class DigestRun {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  /** The ISO week the digest was sent in, e.g. 2026-W23; it reports the weeks before it. */
  @Column({ type: 'varchar', length: 8, unique: true })
  isoWeek: string;

  @Column({ type: 'enum', enum: digestTriggers })
  trigger: DigestTrigger;

  @Column({ type: 'int', default: 0 })
  sent: number;

  @Column({ type: 'int', default: 0 })
  failed: number;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  startedAt: Date;

  @Column({ type: 'datetime', precision: 6, nullable: true })
  finishedAt: Date | null;
}
