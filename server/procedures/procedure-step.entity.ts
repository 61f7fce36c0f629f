import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity({ name: 'procedure_steps' })
@Index(['versionId', 'position'], { unique: true })
export class ProcedureStep {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'int', unsigned: true })
  versionId: number;

  @Column({ type: 'int' })
  position: number;

  @Column({ type: 'varchar', length: 500 })
  text: string;

  @Column({ type: 'varchar', length: 500, nullable: true })
  caution: string | null;
}
