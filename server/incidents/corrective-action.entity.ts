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
import { Incident } from './incident.entity';
import { StaffMember } from '../staff/staff-member.entity';
import { User } from '../users/user.entity';
import { restrict } from '../db/relations';
import { factors, type Factor } from '../../shared/enums';

@Entity({ name: 'corrective_actions' })
@Index(['doneOn', 'dueOn'])
export class CorrectiveAction {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Index()
  @Column({ type: 'int', unsigned: true })
  incidentId: number;

  @ManyToOne(() => Incident, restrict)
  @JoinColumn({ name: 'incidentId' })
  incident?: Relation<Incident>;

  @Column({ type: 'text' })
  what: string;

  @Column({ type: 'int', unsigned: true, nullable: true })
  ownerId: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'ownerId' })
  owner?: Relation<User>;

  /** An owner without an account, from the lab's staff list. */
  @Column({ type: 'int', unsigned: true, nullable: true })
  ownerStaffId: number | null;

  @ManyToOne(() => StaffMember, restrict)
  @JoinColumn({ name: 'ownerStaffId' })
  ownerStaff?: Relation<StaffMember>;

  @Column({ type: 'varchar', length: 120 })
  ownerName: string;

  /** Where a staff owner without an account is mailed; a user owner is mailed at their account's address. */
  @Column({ type: 'varchar', length: 254, nullable: true })
  ownerEmail: string | null;

  @Column({ type: 'date' })
  dueOn: string;

  @Column({ type: 'date', nullable: true })
  doneOn: string | null;

  @Column({ type: 'text', nullable: true })
  verification: string | null;

  /** The factor level the action targets, for the before/after comparison. */
  @Column({ type: 'enum', enum: factors, nullable: true })
  factor: Factor | null;

  @Column({ type: 'varchar', length: 120, nullable: true })
  level: string | null;

  /** When the owner was last told the action is theirs. */
  @Column({ type: 'datetime', precision: 6, nullable: true })
  assignedMailAt: Date | null;

  /** Set once, when the overdue reminder is claimed: a second instance finds it set and sends nothing. */
  @Column({ type: 'datetime', precision: 6, nullable: true })
  overdueMailAt: Date | null;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
