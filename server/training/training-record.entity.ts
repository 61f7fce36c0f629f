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

@Entity({ name: 'training_records' })
@Index(['userId', 'procedureVersionId'])
@Index(['staffId', 'procedureVersionId'])
export class TrainingRecord extends TrainedPersonColumns {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Index()
  @Column({ type: 'varchar', length: 120 })
  personName: string;

  @Column({ type: 'int', unsigned: true, nullable: true })
  trainerId: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'trainerId' })
  trainer?: Relation<User>;

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
