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
import { Culture } from './culture.entity';
import { Photo } from '../photos/photo.entity';
import { User } from '../users/user.entity';
import { restrict } from '../db/relations';
import { agarResults, type AgarResult } from '../../shared/enums';

@Entity({ name: 'agar_tests' })
export class AgarTest {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Index()
  @Column({ type: 'int', unsigned: true })
  cultureId: number;

  @ManyToOne(() => Culture, restrict)
  @JoinColumn({ name: 'cultureId' })
  culture?: Relation<Culture>;

  @Column({ type: 'date' })
  testedOn: string;

  @Column({ type: 'enum', enum: agarResults })
  result: AgarResult;

  @Column({ type: 'int', unsigned: true, nullable: true })
  photoId: number | null;

  @ManyToOne(() => Photo, restrict)
  @JoinColumn({ name: 'photoId' })
  photo?: Relation<Photo>;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Column({ type: 'int', unsigned: true, nullable: true })
  recordedById: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'recordedById' })
  recordedBy?: Relation<User>;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
