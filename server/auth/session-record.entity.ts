import { Column, Entity, PrimaryColumn } from 'typeorm';

/** The table express-mysql-session reads and writes; created by our migration, not by the store. */
@Entity({ name: 'sessions' })
export class SessionRecord {
  @PrimaryColumn({ type: 'varchar', length: 128, name: 'session_id', collation: 'utf8mb4_bin' })
  sessionId: string;

  @Column({ type: 'int', unsigned: true })
  expires: number;

  @Column({ type: 'mediumtext', nullable: true, collation: 'utf8mb4_bin' })
  data: string | null;
}
