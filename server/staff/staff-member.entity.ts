import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/** A person of the lab without an account (or not yet): an operator in the history, a trainee. */
@Entity({ name: 'staff_members' })
export class StaffMember {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  /** Unique under the table's case-insensitive collation, so "ana" and "Ana" are one person. */
  @Index({ unique: true })
  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 254, nullable: true })
  email: string | null;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime', precision: 6 })
  updatedAt: Date;
}
