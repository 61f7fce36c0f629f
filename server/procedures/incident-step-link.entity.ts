import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A trainer's judgement that an incident followed a lapse at this step. */
@Entity({ name: 'incident_step_links' })
@Index(['incidentId', 'stepId'], { unique: true })
@Index(['stepId'])
export class IncidentStepLink {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'int', unsigned: true })
  incidentId: number;

  @Column({ type: 'int', unsigned: true })
  stepId: number;

  @Column({ type: 'int', unsigned: true, nullable: true })
  linkedById: number | null;

  @Column({ type: 'varchar', length: 120 })
  linkedByName: string;

  @Column({ type: 'text', nullable: true })
  note: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
