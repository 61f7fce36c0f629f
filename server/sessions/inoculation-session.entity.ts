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
import { workspaces, type Workspace } from '../../shared/enums';

/** Table name avoids `sessions`, which holds sign-in sessions. */
@Entity({ name: 'inoculation_sessions' })
export class InoculationSession {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'varchar', length: 40, unique: true })
  code: string;

  /** Local date; imported history has no time of day. */
  @Index()
  @Column({ type: 'date' })
  heldOn: string;

  @Column({ type: 'datetime', nullable: true })
  startedAt: Date | null;

  @Column({ type: 'int', unsigned: true, nullable: true })
  operatorId: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'operatorId' })
  operator?: Relation<User>;

  /** An operator without an account, from the lab's staff list. */
  @Index()
  @Column({ type: 'int', unsigned: true, nullable: true })
  staffId: number | null;

  @ManyToOne(() => StaffMember, restrict)
  @JoinColumn({ name: 'staffId' })
  staff?: Relation<StaffMember>;

  /** The user's or staff person's name as it was when the session was recorded. */
  @Index()
  @Column({ type: 'varchar', length: 120, nullable: true })
  operatorName: string | null;

  @Column({ type: 'enum', enum: workspaces, nullable: true })
  workspace: Workspace | null;

  @Column({ type: 'int', unsigned: true, nullable: true })
  procedureVersionId: number | null;

  @ManyToOne(() => ProcedureVersion, restrict)
  @JoinColumn({ name: 'procedureVersionId' })
  procedureVersion?: Relation<ProcedureVersion>;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
