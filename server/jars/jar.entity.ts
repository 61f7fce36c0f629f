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
import { CookRun } from '../cook-runs/cook-run.entity';
import { Culture } from '../cultures/culture.entity';
import { Grain } from '../grain/grain.entity';
import { InoculationSession } from '../sessions/inoculation-session.entity';
import { PrepBatch } from '../grain/prep-batch.entity';
import { restrict } from '../db/relations';
import { jarStatuses, type JarStatus } from '../../shared/enums';

@Entity({ name: 'jars' })
@Index(['room', 'shelf'])
export class Jar {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'varchar', length: 40, unique: true })
  label: string;

  /** Kept beside prepBatchId because imported history names the grain but no batch. */
  @Index()
  @Column({ type: 'int', unsigned: true })
  grainId: number;

  @ManyToOne(() => Grain, restrict)
  @JoinColumn({ name: 'grainId' })
  grain?: Relation<Grain>;

  @Index()
  @Column({ type: 'int', unsigned: true, nullable: true })
  prepBatchId: number | null;

  @ManyToOne(() => PrepBatch, restrict)
  @JoinColumn({ name: 'prepBatchId' })
  prepBatch?: Relation<PrepBatch>;

  @Index()
  @Column({ type: 'int', unsigned: true, nullable: true })
  cookRunId: number | null;

  @ManyToOne(() => CookRun, restrict)
  @JoinColumn({ name: 'cookRunId' })
  cookRun?: Relation<CookRun>;

  @Index()
  @Column({ type: 'int', unsigned: true, nullable: true })
  sessionId: number | null;

  @ManyToOne(() => InoculationSession, restrict)
  @JoinColumn({ name: 'sessionId' })
  session?: Relation<InoculationSession>;

  /** Inoculum: a culture or a parent jar (grain-to-grain), never both. */
  @Index()
  @Column({ type: 'int', unsigned: true, nullable: true })
  cultureId: number | null;

  @ManyToOne(() => Culture, restrict)
  @JoinColumn({ name: 'cultureId' })
  culture?: Relation<Culture>;

  @Index()
  @Column({ type: 'int', unsigned: true, nullable: true })
  parentJarId: number | null;

  @ManyToOne(() => Jar, restrict)
  @JoinColumn({ name: 'parentJarId' })
  parentJar?: Relation<Jar>;

  @Column({ type: 'double', nullable: true })
  inoculumMl: number | null;

  @Index()
  @Column({ type: 'varchar', length: 40, nullable: true })
  room: string | null;

  @Column({ type: 'varchar', length: 40, nullable: true })
  shelf: string | null;

  @Column({ type: 'int', nullable: true })
  shelfPosition: number | null;

  @Index()
  @Column({ type: 'enum', enum: jarStatuses, default: 'incubating' })
  status: JarStatus;

  @Column({ type: 'datetime' })
  inoculatedAt: Date;

  /** Local date in the lab's time zone: analysis periods and ISO weeks group on it. */
  @Index()
  @Column({ type: 'date' })
  inoculatedOn: string;

  @Column({ type: 'date', nullable: true })
  colonisedOn: string | null;

  @Column({ type: 'date', nullable: true })
  endedOn: string | null;

  @Column({ type: 'boolean', default: false })
  imported: boolean;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
