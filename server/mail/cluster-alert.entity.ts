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
import { Incident } from '../incidents/incident.entity';
import { restrict } from '../db/relations';
import { clusterFactors, type ClusterFactor } from '../../shared/enums';

/** A cluster that was alerted; later incidents that extend it update the row instead of mailing again. */
@Entity({ name: 'cluster_alerts' })
@Index(['dimension', 'levelId', 'lastFoundOn'])
export class ClusterAlert {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'enum', enum: clusterFactors })
  dimension: ClusterFactor;

  @Column({ type: 'int', unsigned: true })
  levelId: number;

  @Column({ type: 'varchar', length: 40 })
  levelCode: string;

  @Column({ type: 'date' })
  firstFoundOn: string;

  @Column({ type: 'date' })
  lastFoundOn: string;

  @Column({ type: 'int' })
  incidentCount: number;

  @Column({ type: 'int', unsigned: true })
  triggeredByIncidentId: number;

  @ManyToOne(() => Incident, restrict)
  @JoinColumn({ name: 'triggeredByIncidentId' })
  triggeredByIncident?: Relation<Incident>;

  @CreateDateColumn({ type: 'datetime', precision: 6 })
  alertedAt: Date;

  /** When a supervisor marked the alert looked at; until then it waits in their queue. */
  @Column({ type: 'datetime', precision: 6, nullable: true })
  seenAt: Date | null;

  @Column({ type: 'varchar', length: 120, nullable: true })
  seenByName: string | null;
}
