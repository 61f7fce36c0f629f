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
import { ProcedureVersion } from '../procedures/procedure-version.entity';
import { StaffMember } from '../staff/staff-member.entity';
import { User } from '../users/user.entity';
import { restrict } from '../db/relations';

@Entity({ name: 'retraining_requests' })
export class RetrainRequest {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'int', unsigned: true, nullable: true })
  userId: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'userId' })
  user?: Relation<User>;

  /** A staff person without an account; set instead of the user id. */
  @Column({ type: 'int', unsigned: true, nullable: true })
  staffId: number | null;

  @ManyToOne(() => StaffMember, restrict)
  @JoinColumn({ name: 'staffId' })
  staff?: Relation<StaffMember>;

  @Column({ type: 'int', unsigned: true })
  procedureVersionId: number;

  @ManyToOne(() => ProcedureVersion, restrict)
  @JoinColumn({ name: 'procedureVersionId' })
  procedureVersion?: Relation<ProcedureVersion>;

  @Column({ type: 'int', unsigned: true, nullable: true })
  requestedById: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'requestedById' })
  requestedBy?: Relation<User>;

  @Column({ type: 'text', nullable: true })
  reason: string | null;

  @Index()
  @Column({ type: 'datetime', nullable: true })
  doneAt: Date | null;

  @Index()
  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
