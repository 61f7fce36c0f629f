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
import { f0Sources, logPlacements, type F0Source, type LogPlacement } from '../../shared/enums';

@Entity({ name: 'cook_runs' })
export class CookRun {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'varchar', length: 40, unique: true })
  code: string;

  @Column({ type: 'varchar', length: 80, nullable: true })
  vessel: string | null;

  @Column({ type: 'datetime', nullable: true })
  startedAt: Date | null;

  /** Local date of the run, for listing and filtering. */
  @Index()
  @Column({ type: 'date', nullable: true })
  cookedOn: string | null;

  @Index()
  @Column({ type: 'int' })
  minutesAtPressure: number;

  @Column({ type: 'double', nullable: true })
  gaugeKPa: number | null;

  @Column({ type: 'int', nullable: true })
  ventingMinutes: number | null;

  @Column({ type: 'int', default: 0 })
  altitudeM: number;

  /** 1 L jar, 2 L jar, 3 kg bag…: minutes at pressure mean nothing without it. */
  @Index()
  @Column({ type: 'varchar', length: 40, nullable: true })
  container: string | null;

  @Column({ type: 'int', nullable: true })
  loadCount: number | null;

  @Column({ type: 'int', unsigned: true, nullable: true })
  operatorId: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'operatorId' })
  operator?: Relation<User>;

  @Column({ type: 'varchar', length: 120, nullable: true })
  operatorName: string | null;

  /** F0 in minutes, from the temperature log when there is one, else the upper-bound estimate. */
  @Index()
  @Column({ type: 'double', nullable: true })
  f0: number | null;

  @Column({ type: 'enum', enum: f0Sources, nullable: true })
  f0Source: F0Source | null;

  /** Where the logged probe sat: only a jar-centre log is held to the F0 target (DESIGN §4.6). */
  @Column({ type: 'enum', enum: logPlacements, nullable: true })
  logPlacement: LogPlacement | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
