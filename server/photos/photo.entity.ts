import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  type Relation,
} from 'typeorm';
import { User } from '../users/user.entity';
import { restrict } from '../db/relations';

/** Stored once by content hash; the keys point into the photo storage (local disk or object storage). */
@Entity({ name: 'photos' })
export class Photo {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'char', length: 64, unique: true })
  sha256: string;

  @Column({ type: 'varchar', length: 40 })
  mime: string;

  @Column({ type: 'int', unsigned: true })
  bytes: number;

  @Column({ type: 'int', unsigned: true, nullable: true })
  width: number | null;

  @Column({ type: 'int', unsigned: true, nullable: true })
  height: number | null;

  @Column({ type: 'varchar', length: 200 })
  storageKey: string;

  @Column({ type: 'varchar', length: 200, nullable: true })
  thumbKey: string | null;

  @Column({ type: 'int', unsigned: true, nullable: true })
  uploadedById: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'uploadedById' })
  uploadedBy?: Relation<User>;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
