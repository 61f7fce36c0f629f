import { Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { Incident } from './incident.entity';
import { Jar } from '../jars/jar.entity';
import { restrict } from '../db/relations';

@Entity({ name: 'incident_jars' })
@Index(['jarId'])
export class IncidentJar {
  @PrimaryColumn({ type: 'int', unsigned: true })
  incidentId: number;

  @ManyToOne(() => Incident, restrict)
  @JoinColumn({ name: 'incidentId' })
  incident?: Relation<Incident>;

  @PrimaryColumn({ type: 'int', unsigned: true })
  jarId: number;

  @ManyToOne(() => Jar, restrict)
  @JoinColumn({ name: 'jarId' })
  jar?: Relation<Jar>;
}
