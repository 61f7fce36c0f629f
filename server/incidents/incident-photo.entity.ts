import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { Incident } from './incident.entity';
import { Photo } from '../photos/photo.entity';
import { User } from '../users/user.entity';
import { restrict } from '../db/relations';

@Entity({ name: 'incident_photos' })
export class IncidentPhoto {
  @PrimaryColumn({ type: 'int', unsigned: true })
  incidentId: number;

  @ManyToOne(() => Incident, restrict)
  @JoinColumn({ name: 'incidentId' })
  incident?: Relation<Incident>;

  @PrimaryColumn({ type: 'int', unsigned: true })
  photoId: number;

  @ManyToOne(() => Photo, restrict)
  @JoinColumn({ name: 'photoId' })
  photo?: Relation<Photo>;

  @Column({ type: 'varchar', length: 200, nullable: true })
  caption: string | null;

  @Column({ type: 'int', unsigned: true, nullable: true })
  addedById: number | null;

  @ManyToOne(() => User, restrict)
  @JoinColumn({ name: 'addedById' })
  addedBy?: Relation<User>;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  addedAt: Date;
}
