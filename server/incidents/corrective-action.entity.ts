import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { factors, type Factor } from '../../shared/enums';

@Entity({ name: 'corrective_actions' })
export class CorrectiveAction {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Index()
  @Column({ type: 'int', unsigned: true })
  incidentId: number;

  @Column({ type: 'text' })
  what: string;

  @Column({ type: 'int', unsigned: true, nullable: true })
  ownerId: number | null;

  @Column({ type: 'varchar', length: 120 })
  ownerName: string;

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

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
