import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity({ name: 'retraining_requests' })
export class RetrainingRequest {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'int', unsigned: true, nullable: true })
  userId: number | null;

  /** A staff person without an account; set instead of the user id. */
  @Column({ type: 'int', unsigned: true, nullable: true })
  staffId: number | null;

  @Column({ type: 'int', unsigned: true })
  procedureVersionId: number;

  @Column({ type: 'int', unsigned: true, nullable: true })
  requestedById: number | null;

  @Column({ type: 'text', nullable: true })
  reason: string | null;

  @Index()
  @Column({ type: 'datetime', nullable: true })
  doneAt: Date | null;

  @Index()
  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
