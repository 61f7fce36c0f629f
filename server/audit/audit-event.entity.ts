import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  type Relation,
} from 'typeorm';
import { User } from '../users/user.entity';
import { restrict } from '../db/relations';

/** Append-only: nothing updates or deletes these rows (21 CFR 11.10(e); EU GMP Annex 11 §9). */
@Entity({ name: 'audit_events' })
@Index(['recordType', 'recordId', 'at'])
export class AuditEvent {
  @PrimaryGeneratedColumn({ type: 'bigint', unsigned: true })
  id: string;

  @Column({ type: 'int', unsigned: true, nullable: true })
  userId: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'userId' })
  user?: Relation<User>;

  @Column({ type: 'varchar', length: 120 })
  userName: string;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  at: Date;

  @Column({ type: 'varchar', length: 40 })
  action: string;

  @Column({ type: 'varchar', length: 40 })
  recordType: string;

  @Column({ type: 'varchar', length: 64 })
  recordId: string;

  @Column({ type: 'varchar', length: 64, nullable: true })
  field: string | null;

  @Column({ type: 'text', nullable: true })
  oldValue: string | null;

  @Column({ type: 'text', nullable: true })
  newValue: string | null;

  @Column({ type: 'varchar', length: 500, nullable: true })
  reason: string | null;
}
