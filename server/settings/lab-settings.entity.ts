import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

/** One row (id 1): the lab-wide settings an admin manages. */
@Entity({ name: 'lab_settings' })
export class LabSettings {
  @PrimaryColumn({ type: 'int', unsigned: true })
  id: number;

  /** Whole minutes at pressure; edges 60, 90, 120, 180 give <60, 60-89, 90-119, 120-179, 180+. */
  @Column({ type: 'json' })
  cookBucketEdges: number[];

  /** Cook runs whose F0 falls below this are flagged. */
  @Column({ type: 'double', default: 15 })
  lethalityTarget: number;

  /**
   * Least whole minutes at pressure per container, judging runs without a centre-probe log
   * (DESIGN §4.6). Filled by the HonestLethalityTargets migration.
   */
  @Column({ type: 'json' })
  containerMinutes: Record<string, number>;

  /** The contamination rate the lab accepts, a fraction; weeks above it are marked (DESIGN §4.4). */
  @Column({ type: 'double' })
  contaminationTarget: number;

  @Column({ type: 'int', default: 21 })
  observationWindowDays: number;

  @Column({ type: 'int', default: 3 })
  clusterIncidents: number;

  @Column({ type: 'int', default: 7 })
  clusterDays: number;

  @UpdateDateColumn({ type: 'datetime', precision: 6 })
  updatedAt: Date;
}
