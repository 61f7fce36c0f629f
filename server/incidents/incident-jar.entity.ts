import { Entity, Index, PrimaryColumn } from 'typeorm';

@Entity({ name: 'incident_jars' })
@Index(['jarId'])
export class IncidentJar {
  @PrimaryColumn({ type: 'int', unsigned: true })
  incidentId: number;

  @PrimaryColumn({ type: 'int', unsigned: true })
  jarId: number;
}
