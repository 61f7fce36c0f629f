import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity({ name: 'training_records' })
@Index(['userId', 'procedureVersionId'])
@Index(['staffId', 'procedureVersionId'])
export class TrainingRecord {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'int', unsigned: true, nullable: true })
  userId: number | null;

  /** A staff person without an account; set instead of the user id. */
  @Column({ type: 'int', unsigned: true, nullable: true })
  staffId: number | null;

  @Index()
  @Column({ type: 'varchar', length: 120 })
  personName: string;

  @Column({ type: 'int', unsigned: true })
  procedureVersionId: number;

  @Column({ type: 'int', unsigned: true, nullable: true })
  trainerId: number | null;

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
