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
import { restrict } from '../db/relations';
import { cultureStates, type CultureState } from '../../shared/enums';

/** A syringe or liquid-culture lot that jars are inoculated from. */
@Entity({ name: 'cultures' })
export class Culture {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'varchar', length: 40, unique: true })
  code: string;

  @Index()
  @Column({ type: 'varchar', length: 120, nullable: true })
  species: string | null;

  @Column({ type: 'varchar', length: 120, nullable: true })
  strain: string | null;

  @Index()
  @Column({ type: 'date', nullable: true })
  preparedOn: string | null;

  @Column({ type: 'int', nullable: true })
  generation: number | null;

  @Column({ type: 'double', nullable: true })
  volumeMl: number | null;

  @Index()
  @Column({ type: 'int', unsigned: true, nullable: true })
  parentCultureId: number | null;

  @ManyToOne(() => Culture, restrict)
  @JoinColumn({ name: 'parentCultureId' })
  parentCulture?: Relation<Culture>;

  @Index()
  @Column({ type: 'enum', enum: cultureStates, default: 'quarantined' })
  state: CultureState;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
