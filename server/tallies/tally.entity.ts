import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/**
 * A day and a combination of the keys every factor is read from. A key the jar does not record is 0 (ids)
 * or '' (room), never NULL, so the primary key can find the row to add to.
 */
abstract class Combination {
  @PrimaryColumn({ type: 'date' })
  inoculatedOn: string;

  @PrimaryColumn({ type: 'int', unsigned: true })
  grainId: number;

  @PrimaryColumn({ type: 'int', unsigned: true })
  cookRunId: number;

  @PrimaryColumn({ type: 'int', unsigned: true })
  sessionId: number;

  /** The culture at the root of the jar's lineage (DESIGN.md §3). */
  @PrimaryColumn({ type: 'int', unsigned: true })
  cultureId: number;

  @PrimaryColumn({ type: 'int', unsigned: true })
  prepBatchId: number;

  /** Where the jar stood when found contaminated, or at the end of its observation window. */
  @PrimaryColumn({ type: 'varchar', length: 40 })
  room: string;

  /** Grain-to-grain steps from the root culture, capped at 2. */
  @PrimaryColumn({ type: 'tinyint', unsigned: true })
  transfers: number;
}

/**
 * The analysis counts, kept current in the same transaction as every write that can change a jar's
 * place in them (server/tallies/tallies.service.ts): jars, and contaminated jars, per combination. Rows
 * may fall to 0 jars when jars move between combinations; readers skip them and a rebuild drops them.
 */
@Entity('tally_counts')
export class TallyCount extends Combination {
  @Column({ type: 'int' })
  jars: number;

  @Column({ type: 'int' })
  contaminated: number;
}

/** The contaminated jars of each combination, by days to finding and contaminant (likely causes' hints). */
@Entity('tally_detections')
export class TallyDetection extends Combination {
  /** Days from inoculation to the first live incident. */
  @PrimaryColumn({ type: 'smallint' })
  foundAfterDays: number;

  @PrimaryColumn({ type: 'varchar', length: 40 })
  contaminant: string;

  @Column({ type: 'int' })
  jars: number;
}

/**
 * Each jar's row in tally_counts as last counted: what a recount takes away before it adds the jar again.
 * Indexed by each key and day, so that the jars behind a figure are found and paged in the order they were made.
 */
@Entity('tallied_jars')
@Index('IDX_tallied_jars_grain', ['grainId', 'inoculatedOn'])
@Index('IDX_tallied_jars_cook_run', ['cookRunId', 'inoculatedOn'])
@Index('IDX_tallied_jars_session', ['sessionId', 'inoculatedOn'])
@Index('IDX_tallied_jars_culture', ['cultureId', 'inoculatedOn'])
@Index('IDX_tallied_jars_prep_batch', ['prepBatchId', 'inoculatedOn'])
@Index('IDX_tallied_jars_room', ['room', 'inoculatedOn'])
@Index('IDX_tallied_jars_day', ['inoculatedOn'])
export class TalliedJar {
  @PrimaryColumn({ type: 'int', unsigned: true })
  jarId: number;

  @Column({ type: 'date' })
  inoculatedOn: string;

  @Column({ type: 'int', unsigned: true })
  grainId: number;

  @Column({ type: 'int', unsigned: true })
  cookRunId: number;

  @Column({ type: 'int', unsigned: true })
  sessionId: number;

  @Column({ type: 'int', unsigned: true })
  cultureId: number;

  @Column({ type: 'int', unsigned: true })
  prepBatchId: number;

  @Column({ type: 'varchar', length: 40 })
  room: string;

  @Column({ type: 'tinyint', unsigned: true })
  transfers: number;

  @Column({ type: 'tinyint', unsigned: true })
  contaminated: number;

  @Column({ type: 'smallint' })
  foundAfterDays: number;

  @Column({ type: 'varchar', length: 40 })
  contaminant: string;
}

/** One row (id 1): recounts lock it, so two writers never recount the same rows in different orders. */
@Entity('tally_state')
export class TallyState {
  @PrimaryColumn({ type: 'tinyint', unsigned: true })
  id: number;

  @Column({ type: 'datetime', nullable: true })
  rebuiltAt: Date | null;
}

/**
 * The counts rolled up per day and one factor's key, for questions about one factor (rates, a factor by
 * week, the weekly table): far fewer rows than tally_counts. `levelId` is the grain, cook run, session,
 * culture or prep batch id (0 when not recorded) or the transfers; `room` is used by the room factor only.
 */
@Entity('tally_levels')
export class TallyLevel {
  @PrimaryColumn({ type: 'varchar', length: 12 })
  factor: string;

  @PrimaryColumn({ type: 'int', unsigned: true })
  levelId: number;

  @PrimaryColumn({ type: 'varchar', length: 40 })
  room: string;

  /** Last in the key: a factor's rows are read level by level, so rates group them with no temporary table. */
  @PrimaryColumn({ type: 'date' })
  inoculatedOn: string;

  @Column({ type: 'int' })
  jars: number;

  @Column({ type: 'int' })
  contaminated: number;
}

/** How each jar's time to colonisation ends, as last counted (see colonisation-keys.sql.ts); eligible jars only. */
@Entity('tallied_colonisation')
export class TalliedColonisation {
  @PrimaryColumn({ type: 'int', unsigned: true })
  jarId: number;

  @Column({ type: 'int', unsigned: true })
  grainId: number;

  @Column({ type: 'date' })
  inoculatedOn: string;

  @Column({ type: 'varchar', length: 9 })
  ending: string;

  @Column({ type: 'smallint' })
  days: number;
}

/** Jars per grain, day and ending of their colonisation time: what the colonisation curves read. */
@Entity('tally_colonisation')
export class TallyColonisation {
  @PrimaryColumn({ type: 'int', unsigned: true })
  grainId: number;

  @PrimaryColumn({ type: 'date' })
  inoculatedOn: string;

  @PrimaryColumn({ type: 'varchar', length: 9 })
  ending: string;

  @PrimaryColumn({ type: 'smallint' })
  days: number;

  @Column({ type: 'int' })
  jars: number;
}
