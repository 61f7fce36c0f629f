import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { ProcedureVersion } from './procedure-version.entity';
import { restrict } from '../db/relations';

@Entity({ name: 'procedure_steps' })
@Index(['versionId', 'position'], { unique: true })
export class ProcedureStep {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'int', unsigned: true })
  versionId: number;

  @ManyToOne(() => ProcedureVersion, restrict)
  @JoinColumn({ name: 'versionId' })
  version?: Relation<ProcedureVersion>;

  @Column({ type: 'int' })
  position: number;

  @Column({ type: 'varchar', length: 500 })
  text: string;

  @Column({ type: 'varchar', length: 500, nullable: true })
  caution: string | null;
}
