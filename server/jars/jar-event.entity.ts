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
import { Jar } from './jar.entity';
import { Photo } from '../photos/photo.entity';
import { User } from '../users/user.entity';
import { restrict } from '../db/relations';
import { jarEventTypes, releasedTargets, type JarEventType, type ReleasedTo } from '../../shared/enums';

/** A jar's life after inoculation; a 'check' carries the colonisation percent. */
@Entity({ name: 'jar_events' })
@Index(['jarId', 'at'])
/** Moves only, for the analysis's room at the time a jar was found (DESIGN.md §3). */
@Index(['type', 'jarId', 'at'])
export class JarEvent {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'int', unsigned: true })
  jarId: number;

  @ManyToOne(() => Jar, restrict)
  @JoinColumn({ name: 'jarId' })
  jar?: Relation<Jar>;

  @Column({ type: 'enum', enum: jarEventTypes })
  type: JarEventType;

  @Column({ type: 'datetime' })
  at: Date;

  @Column({ type: 'date' })
  onDate: string;

  @Column({ type: 'int', unsigned: true, nullable: true })
  byUserId: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'byUserId' })
  byUser?: Relation<User>;

  @Column({ type: 'varchar', length: 120 })
  byName: string;

  @Column({ type: 'int', nullable: true })
  percentColonised: number | null;

  @Column({ type: 'varchar', length: 40, nullable: true })
  room: string | null;

  /** The room a move left: with it the analysis finds where a jar stood on any day (DESIGN.md §3). */
  @Column({ type: 'varchar', length: 40, nullable: true })
  fromRoom: string | null;

  @Column({ type: 'varchar', length: 40, nullable: true })
  shelf: string | null;

  @Column({ type: 'enum', enum: releasedTargets, nullable: true })
  releasedTo: ReleasedTo | null;

  @Column({ type: 'varchar', length: 120, nullable: true })
  releasedToWho: string | null;

  @Column({ type: 'varchar', length: 20, nullable: true })
  newStatus: string | null;

  @Column({ type: 'int', unsigned: true, nullable: true })
  photoId: number | null;

  @ManyToOne(() => Photo, restrict)
  @JoinColumn({ name: 'photoId' })
  photo?: Relation<Photo>;

  @Column({ type: 'text', nullable: true })
  note: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  createdAt: Date;
}
