import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** The lab's grain list; imports match against name case-insensitively (the collation does that). */
@Entity({ name: 'grains' })
export class Grain {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'varchar', length: 60, unique: true })
  name: string;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
