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
import { Incident } from '../incidents/incident.entity';
import { ProcedureStep } from './procedure-step.entity';
import { User } from '../users/user.entity';
import { restrict } from '../db/relations';

/** A trainer's judgement that an incident followed a lapse at this step. */
@Entity({ name: 'incident_step_links' })
@Index(['incidentId', 'stepId'], { unique: true })
@Index(['stepId'])
export class IncidentStepLink {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'int', unsigned: true })
  incidentId: number;

  @ManyToOne(() => Incident, restrict)
  @JoinColumn({ name: 'incidentId' })
  incident?: Relation<Incident>;

  @Column({ type: 'int', unsigned: true })
  stepId: number;

  @ManyToOne(() => ProcedureStep, restrict)
  @JoinColumn({ name: 'stepId' })
  step?: Relation<ProcedureStep>;

  @Column({ type: 'int', unsigned: true, nullable: true })
  linkedById: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'linkedById' })
  linkedBy?: Relation<User>;

  @Column({ type: 'varchar', length: 120 })
  linkedByName: string;

  @Column({ type: 'text', nullable: true })
  note: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
