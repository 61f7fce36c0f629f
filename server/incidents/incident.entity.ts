import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
  VersionColumn,
  type Relation,
} from 'typeorm';
import { User } from '../users/user.entity';
import { restrict } from '../db/relations';
import {
  causeCategories,
  contaminants,
  incidentSeverities,
  incidentStatuses,
  stagesFound,
  verdicts,
  type CauseCategory,
  type Contaminant,
  type IncidentSeverity,
  type IncidentStatus,
  type StageFound,
  type Verdict,
} from '../../shared/enums';

/** Never deleted: a mistaken incident is voided with a reason and keeps its history. */
@Entity({ name: 'incidents' })
@Index(['status', 'verdict'])
export class Incident {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Index()
  @Column({ type: 'datetime' })
  foundAt: Date;

  @Index()
  @Column({ type: 'date' })
  foundOn: string;

  @Column({ type: 'int', unsigned: true, nullable: true })
  foundById: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'foundById' })
  foundBy?: Relation<User>;

  @Column({ type: 'varchar', length: 120 })
  foundByName: string;

  @Index()
  @Column({ type: 'enum', enum: stagesFound, default: 'incubation' })
  stage: StageFound;

  @Index()
  @Column({ type: 'enum', enum: contaminants })
  contaminant: Contaminant;

  @Column({ type: 'varchar', length: 120, nullable: true })
  signColour: string | null;

  @Column({ type: 'varchar', length: 120, nullable: true })
  signSmell: string | null;

  @Column({ type: 'varchar', length: 120, nullable: true })
  signTexture: string | null;

  @Index()
  @Column({ type: 'enum', enum: incidentSeverities, default: 'medium' })
  severity: IncidentSeverity;

  @Column({ type: 'boolean', default: false })
  sealed: boolean;

  @Column({ type: 'boolean', default: false })
  sterilisedBeforeDisposal: boolean;

  @Index()
  @Column({ type: 'enum', enum: incidentStatuses, default: 'open' })
  status: IncidentStatus;

  @Index()
  @Column({ type: 'enum', enum: verdicts, default: 'pending' })
  verdict: Verdict;

  @Column({ type: 'boolean', default: false })
  voided: boolean;

  @Column({ type: 'varchar', length: 500, nullable: true })
  voidReason: string | null;

  @Column({ type: 'enum', enum: causeCategories, nullable: true })
  causeCategory: CauseCategory | null;

  @Column({ type: 'text', nullable: true })
  rootCauseNotes: string | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Column({ type: 'boolean', default: false })
  imported: boolean;

  @Column({ type: 'int', unsigned: true, nullable: true })
  createdById: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'createdById' })
  createdBy?: Relation<User>;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime', precision: 6 })
  updatedAt: Date;

  /** Two reviewers saving at once: the second gets a 409 instead of silently overwriting. */
  @VersionColumn({ type: 'int' })
  version: number;
}
