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

@Entity({ name: 'training_records' })
@Index(['userId', 'procedureVersionId'])
@Index(['staffId', 'procedureVersionId'])
export class TrainingRecord {
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

  @Index()
  @Column({ type: 'varchar', length: 120 })
  personName: string;

  @Column({ type: 'int', unsigned: true })
  procedureVersionId: number;

  @ManyToOne(() => ProcedureVersion, restrict)
  @JoinColumn({ name: 'procedureVersionId' })
  procedureVersion?: Relation<ProcedureVersion>;

  @Column({ type: 'int', unsigned: true, nullable: true })
  trainerId: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'trainerId' })
  trainer?: Relation<User>;

  @Column({ type: 'varchar', length: 120 })
  trainerName: string;

  @Index()
  @Column({ type: 'date' })
  trainedOn: string;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Index()
  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
