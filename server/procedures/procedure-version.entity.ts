import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** Publishing copies the steps into a new version; an old version is never rewritten. */
@Entity({ name: 'procedure_versions' })
@Index(['procedureId', 'version'], { unique: true })
export class ProcedureVersion {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'int', unsigned: true })
  procedureId: number;

  @Column({ type: 'int' })
  version: number;

  @Column({ type: 'varchar', length: 200 })
  title: string;

  @Column({ type: 'text', nullable: true })
  changeNote: string | null;

  @Column({ type: 'int', unsigned: true, nullable: true })
  publishedById: number | null;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  publishedAt: Date;
}
