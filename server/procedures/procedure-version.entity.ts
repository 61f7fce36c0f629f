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
import { Procedure } from './procedure.entity';
import { User } from '../users/user.entity';
import { restrict } from '../db/relations';

/** Publishing copies the steps into a new version; an old version is never rewritten. */
@Entity({ name: 'procedure_versions' })
@Index(['procedureId', 'version'], { unique: true })
export class ProcedureVersion {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'int', unsigned: true })
  procedureId: number;

  @ManyToOne(() => Procedure, restrict)
  @JoinColumn({ name: 'procedureId' })
  procedure?: Relation<Procedure>;

  @Column({ type: 'int' })
  version: number;

  @Column({ type: 'varchar', length: 200 })
  title: string;

  @Column({ type: 'text', nullable: true })
  changeNote: string | null;

  @Column({ type: 'int', unsigned: true, nullable: true })
  publishedById: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'publishedById' })
  publishedBy?: Relation<User>;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  publishedAt: Date;
}
