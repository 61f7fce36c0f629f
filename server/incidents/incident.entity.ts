import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
  VersionColumn,
} from 'typeorm';
import {
  causeCategories,
  contaminants,
  incidentStatuses,
  stagesFound,
  verdicts,
  type CauseCategory,
  type Contaminant,
  type IncidentStatus,
  type StageFound,
  type Verdict,
} from '../../shared/enums';

export const severities = ['low', 'medium', 'high'] as const;
export type Severity = (typeof severities)[number];

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
  @Column({ type: 'enum', enum: severities, default: 'medium' })
  severity: Severity;

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

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime', precision: 6 })
  updatedAt: Date;

  /** Two reviewers saving at once: the second gets a 409 instead of silently overwriting. */
  @VersionColumn({ type: 'int' })
  version: number;
}
