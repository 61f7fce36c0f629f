import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

@Entity({ name: 'incident_photos' })
export class IncidentPhoto {
  @PrimaryColumn({ type: 'int', unsigned: true })
  incidentId: number;

  @PrimaryColumn({ type: 'int', unsigned: true })
  photoId: number;

  @Column({ type: 'varchar', length: 200, nullable: true })
  caption: string | null;

  @Column({ type: 'int', unsigned: true, nullable: true })
  addedById: number | null;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  addedAt: Date;
}
