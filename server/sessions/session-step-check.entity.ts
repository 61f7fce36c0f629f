import { Column, Entity, PrimaryColumn } from 'typeorm';

/** The checklist of a session: one row per step of the procedure version it followed. */
@Entity({ name: 'session_step_checks' })
export class SessionStepCheck {
  @PrimaryColumn({ type: 'int', unsigned: true })
  sessionId: number;

  @PrimaryColumn({ type: 'int', unsigned: true })
  stepId: number;

  @Column({ type: 'boolean' })
  done: boolean;
}
