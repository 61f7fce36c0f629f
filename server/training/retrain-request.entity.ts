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
import { User } from '../users/user.entity';
import { restrict } from '../db/relations';
import { TrainedPersonColumns } from './trained-person.columns';

@Entity({ name: 'retraining_requests' })
export class RetrainRequest extends TrainedPersonColumns {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'int', unsigned: true, nullable: true })
  requestedById: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'requestedById' })
  requestedBy?: Relation<User>;

  @Column({ type: 'text', nullable: true })
  reason: string | null;

  @Index()
  @Column({ type: 'datetime', nullable: true })
  doneAt: Date | null;

  @Index()
  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
