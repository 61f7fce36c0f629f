import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { CookRun } from './cook-run.entity';
import { restrict } from '../db/relations';

/** One sample of a cook run's temperature log. */
@Entity({ name: 'cook_run_readings' })
@Index(['cookRunId', 'minute'], { unique: true })
export class CookRunReading {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'int', unsigned: true })
  cookRunId: number;

  @ManyToOne(() => CookRun, restrict)
  @JoinColumn({ name: 'cookRunId' })
  cookRun?: Relation<CookRun>;

  @Column({ type: 'double' })
  minute: number;

  @Column({ type: 'double' })
  celsius: number;
}
