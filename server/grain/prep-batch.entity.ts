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
import { GrainLot } from './grain-lot.entity';
import { restrict } from '../db/relations';

/** Wetness varies batch to batch, which is why jars point at their prep batch. */
@Entity({ name: 'prep_batches' })
export class PrepBatch {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'varchar', length: 40, unique: true })
  code: string;

  @Column({ type: 'int', unsigned: true })
  grainLotId: number;

  @ManyToOne(() => GrainLot, restrict)
  @JoinColumn({ name: 'grainLotId' })
  grainLot?: Relation<GrainLot>;

  @Index()
  @Column({ type: 'date' })
  preparedOn: string;

  @Column({ type: 'double', nullable: true })
  soakHours: number | null;

  @Column({ type: 'int', nullable: true })
  simmerMinutes: number | null;

  @Column({ type: 'int', nullable: true })
  drainMinutes: number | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Index()
  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
