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

/**
 * One write from the shelf under a client-made Idempotency-Key. The row is inserted inside the
 * write's own transaction, so it exists exactly when the write does; the answer is added after.
 */
@Entity({ name: 'idempotent_requests' })
@Index('UQ_idempotent_requests_user_key', ['userId', 'key'], { unique: true })
export class IdempotentRequest {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'int', unsigned: true })
  userId: number;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'userId' })
  user?: Relation<User>;

  @Column({ type: 'varchar', length: 100 })
  key: string;

  /** Which kind of write the key was used for: a repeat aimed at another route is refused. */
  @Column({ type: 'varchar', length: 40 })
  scope: string;

  /** The record the write made (incident id, jar event id), when it made one. */
  @Column({ type: 'int', unsigned: true, nullable: true })
  recordId: number | null;

  @Column({ type: 'smallint', unsigned: true, nullable: true })
  status: number | null;

  @Column({ type: 'longtext', nullable: true })
  body: string | null;

  @Column({ type: 'datetime', precision: 6, nullable: true })
  undoneAt: Date | null;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
