import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** One sample of a cook run's temperature log. */
@Entity({ name: 'cook_run_readings' })
@Index(['cookRunId', 'minute'], { unique: true })
export class CookRunReading {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'int', unsigned: true })
  cookRunId: number;

  @Column({ type: 'double' })
  minute: number;

  @Column({ type: 'double' })
  celsius: number;
}
