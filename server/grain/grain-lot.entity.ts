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
import { Grain } from './grain.entity';
import { restrict } from '../db/relations';

@Entity({ name: 'grain_lots' })
@Index(['grainId', 'supplierLotCode'], { unique: true })
export class GrainLot {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'int', unsigned: true })
  grainId: number;

  @ManyToOne(() => Grain, restrict)
  @JoinColumn({ name: 'grainId' })
  grain?: Relation<Grain>;

  @Index()
  @Column({ type: 'varchar', length: 80 })
  supplierLotCode: string;

  @Index()
  @Column({ type: 'date' })
  receivedOn: string;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Index()
  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
